import type { z } from "zod";
import type { CalcKind } from "./calc-types";
import { combinationsInputs } from "./combinations/combinations-inputs";
import { deflectionInputs } from "./deflection/deflection-inputs";
import { formulaInputs } from "./formula/formula-inputs";
import { jointInputs } from "./joint/joint-inputs";
import { memberDesignInputs } from "./member-design/member-design-inputs";
import { sectionCutInputs } from "./section-cut/section-cut-inputs";
import { trussInputs } from "./truss/truss-inputs";

/** The zod schema of each kind's inputs, for validating a document's calc nodes. */
export const calcInputSchemas: Record<CalcKind, z.ZodType> = {
  truss: trussInputs,
  sectionCut: sectionCutInputs,
  joint: jointInputs,
  formula: formulaInputs,
  combinations: combinationsInputs,
  memberDesign: memberDesignInputs,
  deflection: deflectionInputs,
};
