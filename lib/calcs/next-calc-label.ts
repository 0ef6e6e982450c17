import { calcLabelPrefix, type CalcKind } from "./calc-types";

/**
 * The label for a new calc of `kind`: its prefix and one more than the
 * highest number already used with that prefix (T1, T2 → T3). A gap left by a
 * deleted calc is not reused, so a reference to the deleted T2 stays broken
 * rather than silently reading a different calc.
 */
export function nextCalcLabel(kind: CalcKind, existingLabels: Iterable<string>): string {
  const prefix = calcLabelPrefix[kind];
  const taken = new Set(existingLabels);
  let highest = 0;
  for (const label of taken) {
    if (!label.startsWith(prefix)) continue;
    const digits = label.slice(prefix.length);
    if (/^[0-9]{1,9}$/.test(digits)) highest = Math.max(highest, Number(digits));
  }
  let n = highest + 1;
  while (taken.has(`${prefix}${n}`)) n++;
  return `${prefix}${n}`;
}
