import type { CalcValue } from "./calc-types";

/**
 * A number with its unit for other calcs. Refuses NaN and ±Infinity: a calc
 * that would export one fails with this message rather than passing it on.
 */
export function quantityValue(value: number, unit: string): CalcValue {
  if (!Number.isFinite(value)) throw new Error(`A result came out as ${String(value)} (${unit || "no unit"}); it cannot be passed on to other calcs.`);
  return { type: "quantity", value: value === 0 ? 0 : value, unit };
}
