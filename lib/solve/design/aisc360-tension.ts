import { z } from "zod";
import { texNum, texQty } from "../latex";
import type { Step } from "../types";
import { AISC360_16 } from "./aisc360-factors";
import { parseInput } from "./parse-input";
import { resolveUnits, unitsOptionSchema, type UnitsOption } from "./unit-labels";

/**
 * Inputs of the AISC 360-16 chapter D tension check. Units must be consistent:
 * stress × area gives the force (ksi & in² → kip; MPa & mm² → N). The default
 * labels are kip, in, ksi.
 */
export type Aisc360TensionOptions = {
  /** Specified minimum yield stress. */
  Fy: number;
  /** Specified minimum tensile strength. */
  Fu: number;
  /** Gross area. */
  Ag: number;
  /** Net area (§B4.3b), not more than Ag. */
  An: number;
  /** Shear lag factor, Table D3.1 (0 < U ≤ 1). */
  U: number;
  /** Labels for the steps. */
  units?: UnitsOption;
};

/** Design (LRFD) and allowable (ASD) tensile strengths with the limit state that governs. */
export type Aisc360TensionResult = {
  /** Effective net area, Eq. D3-1. */
  Ae: number;
  /** φt Pn for yielding, Eq. D2-1 (φt = 0.90). */
  phiPnYield: number;
  /** φt Pn for rupture, Eq. D2-2 (φt = 0.75). */
  phiPnRupture: number;
  /** The lesser of the two. */
  phiPn: number;
  governs: "yielding" | "rupture";
  /** Allowable strengths Pn/Ωt (Ωt = 1.67 yielding, 2.00 rupture). */
  asd: {
    PnOmegaYield: number;
    PnOmegaRupture: number;
    PnOmega: number;
    governs: "yielding" | "rupture";
  };
  steps: Step[];
};

const schema = z
  .object({
    Fy: z.number().positive(),
    Fu: z.number().positive(),
    Ag: z.number().positive(),
    An: z.number().positive(),
    U: z.number().positive().max(1),
    units: unitsOptionSchema,
  })
  .refine((o) => o.An <= o.Ag, { path: ["An"], message: "net area An must not exceed the gross area Ag" });

/** Tensile strength to AISC 360-16 §D2 with the effective net area of §D3. */
export function aisc360Tension(options: Aisc360TensionOptions): Aisc360TensionResult {
  const { Fy, Fu, Ag, An, U, units } = parseInput(schema, options);
  const u = resolveUnits(units, "kip-in");
  const f = AISC360_16;

  const Ae = An * U;
  const PnYield = Fy * Ag;
  const PnRupture = Fu * Ae;
  const phiPnYield = f.phiTensionYield * PnYield;
  const phiPnRupture = f.phiTensionRupture * PnRupture;
  const governs = phiPnYield <= phiPnRupture ? "yielding" : "rupture";
  const phiPn = Math.min(phiPnYield, phiPnRupture);

  const PnOmegaYield = PnYield / f.omegaTensionYield;
  const PnOmegaRupture = PnRupture / f.omegaTensionRupture;
  const asdGoverns = PnOmegaYield <= PnOmegaRupture ? "yielding" : "rupture";
  const PnOmega = Math.min(PnOmegaYield, PnOmegaRupture);

  const steps: Step[] = [
    {
      latex: `A_e = A_n U = ${texQty(An, u.area)} \\times ${texNum(U)} = ${texQty(Ae, u.area)}`,
      text: "Effective net area, AISC 360-16 Eq. D3-1.",
    },
    {
      latex: `\\phi_t P_n = 0.90\\,F_y A_g = 0.90 \\times ${texQty(Fy, u.stress)} \\times ${texQty(Ag, u.area)} = ${texQty(phiPnYield, u.force)}`,
      text: "Tensile yielding in the gross section, AISC 360-16 Eq. D2-1 (φt = 0.90).",
    },
    {
      latex: `\\phi_t P_n = 0.75\\,F_u A_e = 0.75 \\times ${texQty(Fu, u.stress)} \\times ${texQty(Ae, u.area)} = ${texQty(phiPnRupture, u.force)}`,
      text: "Tensile rupture in the net section, AISC 360-16 Eq. D2-2 (φt = 0.75).",
    },
    {
      latex: `\\phi_t P_n = \\min(${texNum(phiPnYield)},\\ ${texNum(phiPnRupture)}) = ${texQty(phiPn, u.force)}\\quad\\text{(${governs})}`,
      text: `Design tensile strength (LRFD); ${governs} governs.`,
    },
    {
      latex: `\\frac{P_n}{\\Omega_t} = \\min\\!\\left(\\frac{${texNum(PnYield)}}{1.67},\\ \\frac{${texNum(PnRupture)}}{2.00}\\right) = ${texQty(PnOmega, u.force)}\\quad\\text{(${asdGoverns})}`,
      text: `Allowable tensile strength (ASD), AISC 360-16 §D2 (Ωt = 1.67 yielding, 2.00 rupture); ${asdGoverns} governs.`,
    },
  ];

  return {
    Ae,
    phiPnYield,
    phiPnRupture,
    phiPn,
    governs,
    asd: { PnOmegaYield, PnOmegaRupture, PnOmega, governs: asdGoverns },
    steps,
  };
}
