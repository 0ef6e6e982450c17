import { trussReference } from "../read-truss-value";
import type { JointInputs } from "./joint-inputs";

/** A Joint calc reads the solved truss of the calc it names. */
export function jointReferences(inputs: JointInputs): string[] {
  return [trussReference(inputs.truss)];
}
