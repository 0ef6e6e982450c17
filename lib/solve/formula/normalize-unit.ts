/**
 * A unit as written by the author (`kN m`, `kN / m`) in the one spelling the
 * engine stores and typesets: factors joined by `*`, no spaces (`kN*m`, `kN/m`).
 */
export function normalizeUnit(unit: string): string {
  return unit
    .trim()
    .replace(/\s*([*/^()])\s*/g, "$1")
    .replace(/\s+/g, "*");
}
