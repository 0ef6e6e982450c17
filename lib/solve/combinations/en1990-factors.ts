/**
 * Partial factors for persistent and transient design situations, set B
 * (STR/GEO), EN 1990:2002 Table A1.2(B), recommended values.
 */
export const EN1990_SET_B = {
  /** γG,j,sup: permanent action, unfavourable. */
  gammaGsup: 1.35,
  /** γG,j,inf: permanent action, favourable. */
  gammaGinf: 1.0,
  /** γQ,1 and γQ,i: variable action, unfavourable (0 where favourable). */
  gammaQ: 1.5,
  /** ξ: reduction of unfavourable permanent actions in Eq. 6.10b. */
  xi: 0.85,
} as const;
