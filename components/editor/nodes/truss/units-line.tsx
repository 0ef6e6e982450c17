"use client";

import { useId } from "react";
import type { TrussDraft } from "./truss-draft";
import { trussUnitText } from "./truss-unit-text";

export type UnitsLineProps = {
  units: TrussDraft["units"];
  /** The package's unit system, to point out a truss entered in the other one. */
  packageSystem: "SI" | "US";
  readOnly: boolean;
  /** Called with the new units; the caller converts every value, so the structure stays the same. */
  onChange: (units: TrussDraft["units"]) => void;
};

const SYSTEMS = { SI: { length: "m", force: "kN" }, US: { length: "ft", force: "kip" } } as const;

/** The units every value of the truss is entered in, and the switch between SI and US customary (which converts). */
export function UnitsLine({ units, packageSystem, readOnly, onChange }: UnitsLineProps) {
  const id = useId();
  const t = trussUnitText(units);
  const system = units.length === "m" && units.force === "kN" ? "SI" : units.length === "ft" && units.force === "kip" ? "US" : "mixed";
  return (
    <div className="flex flex-wrap items-center gap-x-3 gap-y-1 text-xs text-ink-soft" data-testid="truss-units">
      <label htmlFor={id} className="font-medium uppercase tracking-wide">Units</label>
      {readOnly ? (
        <span>{system === "US" ? "US customary" : system === "SI" ? "SI" : "Mixed"}</span>
      ) : (
        <select id={id} className="pp-input w-auto py-0.5 text-xs" value={system} onChange={(e) => onChange(e.target.value === "US" ? SYSTEMS.US : SYSTEMS.SI)}>
          <option value="SI">SI (converts values)</option>
          <option value="US">US customary (converts values)</option>
          {system === "mixed" && <option value="mixed">Mixed</option>}
        </select>
      )}
      <span className="pp-num">
        lengths {t.length} · forces {t.force} · areas {t.area} · moduli {t.modulus} · line loads {t.lineLoad}
      </span>
      {system !== "mixed" && system !== packageSystem && (
        <span className="text-caution">△ The package is in {packageSystem === "US" ? "US customary" : "SI"} units; this truss is entered in {system === "US" ? "US customary" : "SI"}.</span>
      )}
    </div>
  );
}
