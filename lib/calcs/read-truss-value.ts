import type { CalcValue, TrussValue } from "./calc-types";

/** The reference a calc makes to read a truss: the `model` value of a Truss or Combinations calc. */
export function trussReference(label: string): string {
  return `${label}.model`;
}

/** The truss another calc exports under `label`, from the values handed to an evaluator; null when it is not a truss. */
export function readTrussValue(resolved: Record<string, CalcValue>, label: string): TrussValue | null {
  const value = resolved[trussReference(label)];
  return value && value.type === "truss" ? value : null;
}
