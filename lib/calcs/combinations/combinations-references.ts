import { trussReference } from "../read-truss-value";
import type { CombinationsInputs } from "./combinations-inputs";

/** A Combinations calc reads the solved truss whose cases it combines. */
export function combinationsReferences(inputs: CombinationsInputs): string[] {
  return [trussReference(inputs.truss)];
}
