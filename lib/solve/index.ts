/**
 * The engineering core's public surface. Pure TypeScript: the same code runs in
 * the browser while an engineer types and on the server when a revision is issued.
 * Tension is positive; x to the right, y up; units are the caller's, consistent.
 */
export type { TrussModel, Joint, Member, Support, JointLoad, LoadCase, Step, Reaction, Displacement, CaseResult, TrussSolution, LengthUnit, ForceUnit } from "./types";
export { SolveError, isSolveError, type SolveErrorCode } from "./errors";
export { texNum, texQty, texSymbol, texUnit, tensionOrCompression } from "./latex";

export { validateTruss, countTruss, solveTruss, convertTrussUnits, type TrussUnits, type TrussCount } from "./truss";
export * from "./generators";
export { cutSection, proposeCuts, resolvePanel, type CutSectionOptions, type CutSectionResult, type ProposeCutsOptions, type ProposedCut, type Panel } from "./sections";
export {
  jointEquilibrium,
  solveByJoints,
  zeroForceMembers,
  type JointEquilibriumOptions,
  type JointEquilibriumResult,
  type SolveByJointsOptions,
  type SolveByJointsResult,
  type JointsStuck,
  type JointBalance,
  type ZeroForceMember,
  type ZeroForceMembersOptions,
} from "./joints";
export { deflection, type DeflectionOptions, type DeflectionResult, type SpanCheck, type VirtualWorkTerm } from "./deflection";
export type { Comparison, ExternalForce, PivotKind, Point } from "./geometry";

export * from "./combinations";
export * from "./design";

export {
  evaluateFormulas,
  listFormulaReferences,
  ENGINEERING_UNITS,
  type EvaluateFormulasOptions,
  type FormulaError,
  type FormulaLineFailure,
  type FormulaLineResult,
  type FormulaLineValue,
  type FormulaNote,
  type FormulaResult,
  type Quantity,
  type UnitSystem as FormulaUnitSystem,
} from "./formula";
export * from "./graph";
