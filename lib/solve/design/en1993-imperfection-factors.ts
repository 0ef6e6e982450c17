/** Buckling curves of EN 1993-1-1 §6.3.1.2. */
export type BucklingCurve = "a0" | "a" | "b" | "c" | "d";

/** Imperfection factor α per buckling curve, EN 1993-1-1:2005 Table 6.1. */
export const imperfectionFactors: Readonly<Record<BucklingCurve, number>> = {
  a0: 0.13,
  a: 0.21,
  b: 0.34,
  c: 0.49,
  d: 0.76,
};

/** Partial factors recommended in EN 1993-1-1:2005 §6.1(1) Note 2B (a National Annex may set others). */
export const EN1993_RECOMMENDED_GAMMA = { gammaM0: 1.0, gammaM1: 1.0, gammaM2: 1.25 } as const;
