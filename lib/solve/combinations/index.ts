/**
 * Load combinations: ASCE/SEI 7-16 and 7-22 strength design, ASCE/SEI 7-16
 * allowable stress design, EN 1990 Eq. 6.10 and 6.10a/b, or custom factors;
 * applied to one load effect or to per-case result vectors.
 */
export { combineCases } from "./combine-cases";
export { combineLoads } from "./combine-loads";
export { asce716Asd } from "./asce7-16-asd";
export { asce716Lrfd } from "./asce7-16-lrfd";
export { asce722Lrfd } from "./asce7-22-lrfd";
export { EN1990_SET_B } from "./en1990-factors";
export { defaultPsi0, psiFactors } from "./psi-factors";

export type { AsceTable, AsceTemplate } from "./asce-template";
export type { CaseExtreme, CombineCase, CombineCasesOptions, CombineCasesResult, CustomFactorSet } from "./combine-cases";
export type { PsiCategory, PsiValues } from "./psi-factors";
export type { AsceKind, Combination, CombineLoadsOptions, CombineLoadsResult, EnKind, Extreme, LoadAction, LoadStandard } from "./types";
