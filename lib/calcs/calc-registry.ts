import { defineCalcKind, type CalcKindEntry } from "./calc-kind-module";
import type { CalcKind } from "./calc-types";
import { combinationsDefaults, combinationsInputs } from "./combinations/combinations-inputs";
import { combinationsReferences } from "./combinations/combinations-references";
import { evaluateCombinations } from "./combinations/evaluate-combinations";
import { deflectionDefaults, deflectionInputs } from "./deflection/deflection-inputs";
import { deflectionReferences } from "./deflection/deflection-references";
import { evaluateDeflection } from "./deflection/evaluate-deflection";
import { formulaDefaults, formulaInputs } from "./formula/formula-inputs";
import { formulaReferences } from "./formula/formula-references";
import { evaluateFormula } from "./formula/evaluate-formula";
import { jointDefaults, jointInputs } from "./joint/joint-inputs";
import { jointReferences } from "./joint/joint-references";
import { evaluateJoint } from "./joint/evaluate-joint";
import { memberDesignDefaults, memberDesignInputs } from "./member-design/member-design-inputs";
import { memberDesignReferences } from "./member-design/member-design-references";
import { evaluateMemberDesign } from "./member-design/evaluate-member-design";
import { sectionCutDefaults, sectionCutInputs } from "./section-cut/section-cut-inputs";
import { sectionCutReferences } from "./section-cut/section-cut-references";
import { evaluateSectionCut } from "./section-cut/evaluate-section-cut";
import { evaluateTruss } from "./truss/evaluate-truss";
import { trussDefaults, trussInputs } from "./truss/truss-inputs";
import { trussReferences } from "./truss/truss-references";

/** Every calc kind: its inputs schema, starting inputs, references and evaluator. */
export const calcRegistry: Record<CalcKind, CalcKindEntry> = {
  truss: defineCalcKind({ inputs: trussInputs, defaults: trussDefaults, references: trussReferences, evaluate: evaluateTruss }),
  sectionCut: defineCalcKind({ inputs: sectionCutInputs, defaults: sectionCutDefaults, references: sectionCutReferences, evaluate: evaluateSectionCut }),
  joint: defineCalcKind({ inputs: jointInputs, defaults: jointDefaults, references: jointReferences, evaluate: evaluateJoint }),
  formula: defineCalcKind({ inputs: formulaInputs, defaults: formulaDefaults, references: formulaReferences, evaluate: evaluateFormula }),
  combinations: defineCalcKind({ inputs: combinationsInputs, defaults: combinationsDefaults, references: combinationsReferences, evaluate: evaluateCombinations }),
  memberDesign: defineCalcKind({ inputs: memberDesignInputs, defaults: memberDesignDefaults, references: memberDesignReferences, evaluate: evaluateMemberDesign }),
  deflection: defineCalcKind({ inputs: deflectionInputs, defaults: deflectionDefaults, references: deflectionReferences, evaluate: evaluateDeflection }),
};
