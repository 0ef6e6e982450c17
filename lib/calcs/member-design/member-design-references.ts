import { trussReference } from "../read-truss-value";
import type { MemberDesignInputs } from "./member-design-inputs";

/**
 * The truss, and the Combinations calc when `source` is the label of a calc
 * in the package (otherwise `source` is a load case of the truss).
 */
export function memberDesignReferences(inputs: MemberDesignInputs, labels: ReadonlySet<string>): string[] {
  const refs = [trussReference(inputs.truss)];
  if (inputs.source && inputs.source !== inputs.truss && labels.has(inputs.source)) refs.push(trussReference(inputs.source));
  return refs;
}
