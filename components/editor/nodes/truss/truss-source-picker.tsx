"use client";

import { useId } from "react";
import { CaseSelect } from "./case-select";
import { trussCases, type TrussSource } from "./truss-sources";

export type TrussSourcePickerProps = {
  sources: readonly TrussSource[];
  /** Label of the calc read, as stored. */
  truss: string;
  /** Case or combination as stored; empty means the truss's first. */
  loadCase: string;
  readOnly: boolean;
  onChange: (next: { truss: string; loadCase: string }) => void;
};

/**
 * Which Truss (or Combinations) calc to read and which of its cases. A name
 * the package no longer has stays shown, marked, rather than the select
 * silently showing another calc.
 */
export function TrussSourcePicker({ sources, truss, loadCase, readOnly, onChange }: TrussSourcePickerProps) {
  const id = useId();
  const source = sources.find((s) => s.label === truss);
  const cases = trussCases(source?.value ?? null);
  const shownCase = loadCase || cases[0]?.id || "";
  const caseOptions = shownCase && !cases.some((c) => c.id === shownCase) ? [...cases, { id: shownCase, label: `${shownCase} (not in ${truss})` }] : cases;
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
      <span className="inline-flex items-center gap-2 text-sm">
        <label htmlFor={id} className="pp-label mb-0">Truss</label>
        <select id={id} className="pp-input w-auto py-0.5" value={truss} disabled={readOnly} onChange={(e) => onChange({ truss: e.target.value, loadCase: "" })}>
          {!source && <option value={truss}>{truss ? `${truss} (not in this package)` : "—"}</option>}
          {sources.map((s) => (
            <option key={s.label} value={s.label}>
              {s.label} ({s.kind === "truss" ? "Truss" : "Combinations"}{s.value ? "" : ", has a problem"})
            </option>
          ))}
        </select>
      </span>
      <CaseSelect label="Case or combination" cases={caseOptions} value={shownCase} disabled={readOnly} onChange={(c) => onChange({ truss, loadCase: c })} />
    </div>
  );
}
