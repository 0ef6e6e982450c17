import { trussReference } from "../read-truss-value";
import type { DeflectionInputs } from "./deflection-inputs";

/** A Deflection calc reads the solved truss of the calc it names. */
export function deflectionReferences(inputs: DeflectionInputs): string[] {
  return [trussReference(inputs.truss)];
}
