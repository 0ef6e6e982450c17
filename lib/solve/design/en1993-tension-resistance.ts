import { z } from "zod";
import { texNum, texQty } from "../latex";
import type { Step } from "../types";
import { EN1993_RECOMMENDED_GAMMA } from "./en1993-imperfection-factors";
import { parseInput } from "./parse-input";
import { resolveUnits, unitsOptionSchema, type UnitsOption } from "./unit-labels";

/**
 * Inputs of the EN 1993-1-1 §6.2.3 tension resistance. Units consistent
 * (MPa & mm² → N by default labels).
 */
export type En1993TensionResistanceOptions = {
  /** Gross area. */
  A: number;
  /** Yield strength. */
  fy: number;
  /** Net area at holes for fasteners (not more than A). */
  Anet: number;
  /** Ultimate tensile strength. */
  fu: number;
  /** Partial factor for cross-section resistance, default 1.0 (§6.1 Note 2B). */
  gammaM0?: number;
  /** Partial factor for rupture in tension, default 1.25 (§6.1 Note 2B). */
  gammaM2?: number;
  units?: UnitsOption;
};

/** Design tension resistance, the lesser of Eq. 6.6 and Eq. 6.7. */
export type En1993TensionResistanceResult = {
  /** Npl,Rd = A fy / γM0, Eq. 6.6. */
  NplRd: number;
  /** Nu,Rd = 0.9 Anet fu / γM2, Eq. 6.7. */
  NuRd: number;
  /** Nt,Rd = min(Npl,Rd, Nu,Rd), §6.2.3(2). */
  NtRd: number;
  governs: "yielding" | "rupture";
  steps: Step[];
};

const schema = z
  .object({
    A: z.number().positive(),
    fy: z.number().positive(),
    Anet: z.number().positive(),
    fu: z.number().positive(),
    gammaM0: z.number().positive().default(EN1993_RECOMMENDED_GAMMA.gammaM0),
    gammaM2: z.number().positive().default(EN1993_RECOMMENDED_GAMMA.gammaM2),
    units: unitsOptionSchema,
  })
  .refine((o) => o.Anet <= o.A, { path: ["Anet"], message: "net area Anet must not exceed the gross area A" });

/** Tension resistance to EN 1993-1-1:2005 §6.2.3 (category C connections, Eq. 6.8, not covered). */
export function en1993TensionResistance(options: En1993TensionResistanceOptions): En1993TensionResistanceResult {
  const { A, fy, Anet, fu, gammaM0, gammaM2, units } = parseInput(schema, options);
  const u = resolveUnits(units, "N-mm");
  const NplRd = (A * fy) / gammaM0;
  const NuRd = (0.9 * Anet * fu) / gammaM2;
  const governs = NplRd <= NuRd ? "yielding" : "rupture";
  const NtRd = Math.min(NplRd, NuRd);
  const steps: Step[] = [
    {
      latex: `N_{pl,Rd} = \\frac{A f_y}{\\gamma_{M0}} = \\frac{${texQty(A, u.area)} \\times ${texQty(fy, u.stress)}}{${texNum(gammaM0)}} = ${texQty(NplRd, u.force)}`,
      text: "Plastic resistance of the gross section, EN 1993-1-1 Eq. 6.6.",
    },
    {
      latex: `N_{u,Rd} = \\frac{0.9 A_{net} f_u}{\\gamma_{M2}} = \\frac{0.9 \\times ${texQty(Anet, u.area)} \\times ${texQty(fu, u.stress)}}{${texNum(gammaM2)}} = ${texQty(NuRd, u.force)}`,
      text: "Ultimate resistance of the net section at fastener holes, EN 1993-1-1 Eq. 6.7.",
    },
    {
      latex: `N_{t,Rd} = \\min(N_{pl,Rd},\\ N_{u,Rd}) = ${texQty(NtRd, u.force)}`,
      text: `Design tension resistance, EN 1993-1-1 §6.2.3(2); ${governs === "yielding" ? "gross-section yielding" : "net-section rupture"} governs.`,
    },
  ];
  return { NplRd, NuRd, NtRd, governs, steps };
}
