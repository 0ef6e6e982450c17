import { formulaMath } from "./formula-math";

/** What the engine needs to know about a unit string: its size in SI base units and its dimension. */
export type UnitInfo = {
  /** Value of one of this unit in SI base units (1 kN → 1000, 1 deg → π/180). */
  factor: number;
  /** Exponents of mathjs's base dimensions, in `formulaMath.Unit.BASE_DIMENSIONS` order. */
  dims: readonly number[];
};

/** Answer of {@link unitInfo}: the unit, or why it cannot be used. */
export type UnitLookup = { ok: true; info: UnitInfo } | { ok: false; message: string };

// Unit strings repeat on every keystroke; parsing one with mathjs costs tens of microseconds.
const cache = new Map<string, UnitLookup>();
const CACHE_LIMIT = 2000;

/** Reads a unit string such as `kN*m`, `kN/m^2` or `in^4`; "" is a plain number. */
export function unitInfo(unit: string): UnitLookup {
  const hit = cache.get(unit);
  if (hit) return hit;
  const found = lookUp(unit);
  if (cache.size >= CACHE_LIMIT) cache.clear();
  cache.set(unit, found);
  return found;
}

/** True when `name` alone is a unit mathjs knows (with or without a prefix: `kN`, `mm`, `ksi`). */
export function isUnitName(name: string): boolean {
  return formulaMath.Unit.isValuelessUnit(name);
}

const DIMENSIONLESS: readonly number[] = Object.freeze(formulaMath.Unit.BASE_DIMENSIONS.map(() => 0));

function lookUp(unit: string): UnitLookup {
  if (unit.trim() === "") return { ok: true, info: { factor: 1, dims: DIMENSIONLESS } };
  let parsed;
  try {
    parsed = formulaMath.unit(1, unit);
  } catch (e) {
    return { ok: false, message: `${unit} is not a unit (${e instanceof Error ? e.message : String(e)})` };
  }
  // Offsets (degC, degF) do not survive multiplication; structural formulas never need them.
  if (parsed.units.some((u) => u.unit.offset !== 0)) {
    return { ok: false, message: `${unit} has an offset (like degC); use K for temperatures` };
  }
  const factor = parsed.value ?? Number.NaN;
  if (!Number.isFinite(factor) || factor === 0) return { ok: false, message: `${unit} is not a usable unit` };
  return { ok: true, info: { factor, dims: Object.freeze([...parsed.dimensions]) } };
}
