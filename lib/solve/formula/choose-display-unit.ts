import { cleanNumber } from "./clean-number";
import { dimensionName, engineeringUnitsFor } from "./engineering-units";
import type { UnitSystem } from "./formula-types";
import { type Measure, sameDims } from "./measure";
import { normalizeUnit } from "./normalize-unit";
import { unitInfo } from "./unit-info";

/** The unit a result is shown in and its value in that unit, or why the requested unit does not fit. */
export type DisplayChoice = { ok: true; unit: string; value: number } | { ok: false; message: string };

/**
 * Picks the unit for a result: the `-> unit` the author asked for (which must
 * have the result's dimension); else the unit the working carried (`hint`) when
 * it is an engineering unit of the system; else the system's engineering unit
 * for the dimension; else SI base units.
 */
export function chooseDisplayUnit(m: Measure, system: UnitSystem, target?: string): DisplayChoice {
  if (target !== undefined) return inTarget(m, system, normalizeUnit(target));
  const listed = engineeringUnitsFor(m.dims, system);
  if (listed) {
    const hint = m.hint;
    const keep = hint !== undefined && (listed.includes(hint) || listed.some((u) => sameUnit(u, hint)));
    return express(m, keep ? hint : listed[0]);
  }
  if (m.hint !== undefined) {
    const hinted = unitInfo(m.hint);
    if (hinted.ok && sameDims(hinted.info.dims, m.dims)) return express(m, m.hint);
  }
  return express(m, siBaseUnit(m.dims));
}

function inTarget(m: Measure, system: UnitSystem, target: string): DisplayChoice {
  if (target === "") return { ok: false, message: "-> needs a unit after it" };
  const found = unitInfo(target);
  if (!found.ok) return found;
  if (!sameDims(found.info.dims, m.dims)) {
    const natural = chooseDisplayUnit(m, system);
    const shown = natural.ok && natural.unit ? ` (${natural.unit})` : "";
    const what = dimensionName(m.dims) ?? "quantity";
    const asked = dimensionName(found.info.dims);
    return {
      ok: false,
      message: `cannot show a ${what}${shown} in ${target}${asked ? `, which is a ${asked}` : ""}`,
    };
  }
  return express(m, target);
}

function express(m: Measure, unit: string): DisplayChoice {
  const found = unitInfo(unit);
  if (!found.ok) return found;
  return { ok: true, unit, value: cleanNumber(m.si / found.info.factor) };
}

function sameUnit(a: string, b: string): boolean {
  const x = unitInfo(a);
  const y = unitInfo(b);
  if (!x.ok || !y.ok) return false;
  return sameDims(x.info.dims, y.info.dims) && Math.abs(x.info.factor - y.info.factor) <= 1e-9 * Math.abs(x.info.factor);
}

const SI_BASE = ["kg", "m", "s", "A", "K", "cd", "mol", "rad", "bit"];

/** Dimensions outside the engineering table are written in SI base units, e.g. `kg*m^2/s^3`. */
function siBaseUnit(dims: readonly number[]): string {
  const power = (name: string, p: number) => (p === 1 ? name : `${name}^${cleanNumber(p)}`);
  const up = dims.flatMap((p, i) => (p > 1e-9 ? [power(SI_BASE[i], p)] : []));
  const down = dims.flatMap((p, i) => (p < -1e-9 ? [power(SI_BASE[i], -p)] : []));
  if (up.length === 0) return dims.flatMap((p, i) => (p < -1e-9 ? [`${SI_BASE[i]}^${cleanNumber(p)}`] : [])).join("*");
  if (down.length === 0) return up.join("*");
  return `${up.join("*")}/${down.length > 1 ? `(${down.join("*")})` : down[0]}`;
}
