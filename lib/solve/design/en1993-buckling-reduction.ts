import { z } from "zod";
import { texNum } from "../latex";
import type { Step } from "../types";
import { imperfectionFactors, type BucklingCurve } from "./en1993-imperfection-factors";
import { parseInput } from "./parse-input";

/** Inputs of the flexural-buckling reduction factor, EN 1993-1-1 §6.3.1.2. */
export type En1993BucklingReductionOptions = {
  /** Non-dimensional slenderness λ̄ (≥ 0). */
  lambdaBar: number;
  /** Buckling curve from Table 6.2. */
  curve: BucklingCurve;
};

/** The reduction factor and its intermediate values. */
export type En1993BucklingReductionResult = {
  /** Imperfection factor, Table 6.1. */
  alpha: number;
  /** Φ = 0.5[1 + α(λ̄ − 0.2) + λ̄²]. */
  Phi: number;
  /** χ of Eq. 6.49, not more than 1.0. */
  chi: number;
  steps: Step[];
};

const schema = z.object({
  lambdaBar: z.number().nonnegative(),
  curve: z.enum(["a0", "a", "b", "c", "d"]),
});

/** χ to EN 1993-1-1:2005 Eq. 6.49 for the given slenderness and buckling curve. */
export function en1993BucklingReduction(options: En1993BucklingReductionOptions): En1993BucklingReductionResult {
  const { lambdaBar, curve } = parseInput(schema, options);
  const alpha = imperfectionFactors[curve];
  const Phi = 0.5 * (1 + alpha * (lambdaBar - 0.2) + lambdaBar ** 2);
  // Φ − λ̄ = 0.5[(1 − λ̄)² + α(λ̄ − 0.2)] > 0 for λ̄ ≥ 0 and α ≤ 0.76, so the root
  // is real; the clamp only guards round-off.
  const root = Math.sqrt(Math.max(Phi ** 2 - lambdaBar ** 2, 0));
  const chiRaw = 1 / (Phi + root);
  const chi = Math.min(chiRaw, 1);

  const steps: Step[] = [
    {
      latex: `\\alpha = ${texNum(alpha)}\\quad\\text{(curve ${curve})}`,
      text: "Imperfection factor, EN 1993-1-1 Table 6.1.",
    },
    {
      latex: `\\Phi = 0.5\\left[1 + \\alpha(\\bar\\lambda - 0.2) + \\bar\\lambda^2\\right] = 0.5\\left[1 + ${texNum(alpha)}(${texNum(lambdaBar)} - 0.2) + ${texNum(lambdaBar)}^2\\right] = ${texNum(Phi)}`,
      text: "EN 1993-1-1 §6.3.1.2(1).",
    },
    {
      latex: `\\chi = \\frac{1}{\\Phi + \\sqrt{\\Phi^2 - \\bar\\lambda^2}} = \\frac{1}{${texNum(Phi)} + \\sqrt{${texNum(Phi)}^2 - ${texNum(lambdaBar)}^2}} = ${texNum(chiRaw)}${chiRaw > 1 ? "\\;\\Rightarrow\\; \\chi = 1.0" : ""}`,
      text: `EN 1993-1-1 Eq. 6.49, χ ≤ 1.0.${lambdaBar <= 0.2 ? " With λ̄ ≤ 0.2 buckling effects may be ignored (§6.3.1.2(4))." : ""}`,
    },
  ];
  return { alpha, Phi, chi, steps };
}
