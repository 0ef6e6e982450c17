import { trussReference } from "../read-truss-value";
import type { SectionCutInputs } from "./section-cut-inputs";

/** A Section cut reads the solved truss of the calc it names. */
export function sectionCutReferences(inputs: SectionCutInputs): string[] {
  return [trussReference(inputs.truss)];
}
