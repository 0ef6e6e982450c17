/**
 * Resistance and safety factors of AISC 360-16 used by the tension and
 * compression checks, each with its clause.
 */
export const AISC360_16 = {
  /** §D2(a) tensile yielding in the gross section. */
  phiTensionYield: 0.9,
  /** §D2(a), ASD. */
  omegaTensionYield: 1.67,
  /** §D2(b) tensile rupture in the net section. */
  phiTensionRupture: 0.75,
  /** §D2(b), ASD. */
  omegaTensionRupture: 2.0,
  /** §E1 compression. */
  phiCompression: 0.9,
  /** §E1, ASD. */
  omegaCompression: 1.67,
  /** §E2 User Note: KL/r preferably not over 200 (a recommendation, not a requirement). */
  compressionSlendernessLimit: 200,
  /** §D1 User Note: L/r preferably not over 300 for tension members other than rods and hangers. */
  tensionSlendernessLimit: 300,
} as const;
