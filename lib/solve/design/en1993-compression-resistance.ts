import { z } from "zod";
import { texNum, texQty } from "../latex";
import type { Step } from "../types";
import { en1993BucklingReduction } from "./en1993-buckling-reduction";
import { EN1993_RECOMMENDED_GAMMA, type BucklingCurve } from "./en1993-imperfection-factors";
import { parseInput } from "./parse-input";
import { resolveUnits, unitsOptionSchema, type UnitsOption } from "./unit-labels";

/**
 * Inputs of the EN 1993-1-1 §6.3.1 flexural buckling resistance of a class 1,
 * 2 or 3 cross-section. Units consistent (N, mm, MPa by default labels).
 */
export type En1993CompressionResistanceOptions = {
  /** Gross area. */
  A: number;
  /** Yield strength. */
  fy: number;
  /** Modulus of elasticity (210 000 MPa, EN 1993-1-1 §3.2.6). */
  E: number;
  /** Buckling length in the plane considered (≥ 0). */
  Lcr: number;
  /** Radius of gyration about the axis considered. */
  i: number;
  /** Buckling curve from Table 6.2. */
  curve: BucklingCurve;
  /** Partial factor for member instability, default 1.0 (§6.1 Note 2B). */
  gammaM1?: number;
  units?: UnitsOption;
};

/** Buckling resistance and its intermediate values. */
export type En1993CompressionResistanceResult = {
  /** λ1 = π √(E/fy), §6.3.1.3(1). */
  lambda1: number;
  /** λ̄ = (Lcr / i) / λ1, Eq. 6.50. */
  lambdaBar: number;
  alpha: number;
  Phi: number;
  chi: number;
  /** Nb,Rd = χ A fy / γM1, Eq. 6.47. */
  NbRd: number;
  steps: Step[];
};

const schema = z.object({
  A: z.number().positive(),
  fy: z.number().positive(),
  E: z.number().positive(),
  Lcr: z.number().nonnegative(),
  i: z.number().positive(),
  curve: z.enum(["a0", "a", "b", "c", "d"]),
  gammaM1: z.number().positive().default(EN1993_RECOMMENDED_GAMMA.gammaM1),
  units: unitsOptionSchema,
});

/** Flexural buckling resistance to EN 1993-1-1:2005 §6.3.1.1–6.3.1.3 (class 4 sections, Aeff, not covered). */
export function en1993CompressionResistance(options: En1993CompressionResistanceOptions): En1993CompressionResistanceResult {
  const { A, fy, E, Lcr, i, curve, gammaM1, units } = parseInput(schema, options);
  const u = resolveUnits(units, "N-mm");
  const lambda1 = Math.PI * Math.sqrt(E / fy);
  const lambdaBar = Lcr / i / lambda1;
  const reduction = en1993BucklingReduction({ lambdaBar, curve });
  const NbRd = (reduction.chi * A * fy) / gammaM1;
  const steps: Step[] = [
    {
      latex: `\\lambda_1 = \\pi\\sqrt{E/f_y} = \\pi\\sqrt{${texQty(E, u.stress)} / ${texQty(fy, u.stress)}} = ${texNum(lambda1)}`,
      text: "EN 1993-1-1 §6.3.1.3(1).",
    },
    {
      latex: `\\bar\\lambda = \\frac{L_{cr}}{i\\,\\lambda_1} = \\frac{${texQty(Lcr, u.length)}}{${texQty(i, u.length)} \\times ${texNum(lambda1)}} = ${texNum(lambdaBar)}`,
      text: "Non-dimensional slenderness, EN 1993-1-1 Eq. 6.50 (class 1, 2 and 3 cross-sections).",
    },
    ...reduction.steps,
    {
      latex: `N_{b,Rd} = \\frac{\\chi A f_y}{\\gamma_{M1}} = \\frac{${texNum(reduction.chi)} \\times ${texQty(A, u.area)} \\times ${texQty(fy, u.stress)}}{${texNum(gammaM1)}} = ${texQty(NbRd, u.force)}`,
      text: "Design buckling resistance, EN 1993-1-1 Eq. 6.47.",
    },
  ];
  return { lambda1, lambdaBar, alpha: reduction.alpha, Phi: reduction.Phi, chi: reduction.chi, NbRd, steps };
}
