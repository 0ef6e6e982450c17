export { affectedBy } from "./affected-by";
export { buildCalcGraph } from "./build-calc-graph";
export { recomputePackage } from "./recompute-package";
export type { BrokenReference, CalcCycle, CalcGraph, GraphCalc } from "./graph-types";
export type { CalcIssue, CalcOutcome, PackageRecompute, RecomputePackageOptions } from "./recompute-types";
