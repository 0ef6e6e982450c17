import type { CellValue } from "./input-column";

/**
 * A stored value as the text to show in its cell. Numbers lose binary noise
 * (2.9999999999999996 shows as 3) but keep every digit an engineer typed.
 */
export function formatCell(value: CellValue): string {
  if (value === undefined) return "";
  if (typeof value === "number") {
    if (!Number.isFinite(value)) return "";
    return String(Number(value.toPrecision(12)));
  }
  return value;
}
