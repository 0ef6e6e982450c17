import type { CalcNode } from "./calc-types";
import { locateCalcs } from "./locate-calcs";

/**
 * The calcs of a package document (TipTap JSON) in document order: each node
 * whose type is a calc kind, with its attrs `id`, `label` and `inputs`.
 */
export function extractCalcs(document: unknown): CalcNode[] {
  return locateCalcs(document).map((c) => c.calc);
}
