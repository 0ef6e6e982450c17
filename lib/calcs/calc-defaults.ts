import { calcRegistry } from "./calc-registry";
import type { CalcKind } from "./calc-types";

/**
 * The inputs a newly inserted calc of `kind` starts from: a fresh object each
 * call. The defaults of the dependent kinds read T1 and its joints L2 and
 * member U1U2, which the default Truss has.
 */
export function calcDefaults(kind: CalcKind): unknown {
  return calcRegistry[kind].defaults();
}
