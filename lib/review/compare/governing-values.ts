import type { CalcResult } from "@/lib/calcs/calc-types";
import type { Quantity, ValueChange } from "./snapshot";

/** The calc's exported quantities by name (whole-truss values are not single numbers and are left out). */
export function quantitiesOf(result: CalcResult | undefined): Map<string, Quantity> {
  const out = new Map<string, Quantity>();
  for (const [name, v] of Object.entries(result?.exports ?? {})) if (v.type === "quantity") out.set(name, { value: v.value, unit: v.unit });
  return out;
}

/** The quantities whose value or unit differ, in the newer result's order, then those only the older one had. */
export function changedValues(older: CalcResult | undefined, newer: CalcResult | undefined): ValueChange[] {
  const a = quantitiesOf(older);
  const b = quantitiesOf(newer);
  const names = [...b.keys(), ...[...a.keys()].filter((k) => !b.has(k))];
  const out: ValueChange[] = [];
  for (const name of names) {
    const o = a.get(name) ?? null;
    const n = b.get(name) ?? null;
    if (o && n && o.value === n.value && o.unit === n.unit) continue;
    out.push({ name, old: o, new: n });
  }
  return out;
}
