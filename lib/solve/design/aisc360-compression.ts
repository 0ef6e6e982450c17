import { z } from "zod";
import { texNum, texQty } from "../latex";
import type { Step } from "../types";
import { AISC360_16 } from "./aisc360-factors";
import { parseInput } from "./parse-input";
import { resolveUnits, unitsOptionSchema, type UnitsOption } from "./unit-labels";

/**
 * Inputs of the AISC 360-16 §E3 flexural-buckling stress. Fy and E in the same
 * stress unit (default label ksi).
 */
export type Aisc360CompressionOptions = {
  /** Specified minimum yield stress. */
  Fy: number;
  /** Modulus of elasticity (29 000 ksi for steel, §B2 / Table footnotes). */
  E: number;
  /** Slenderness Lc/r = KL/r (≥ 0). */
  KLr: number;
  units?: UnitsOption;
};

/** Critical stresses of §E3 for a member without slender elements. */
export type Aisc360CompressionResult = {
  /** Elastic buckling stress, Eq. E3-4; null when KL/r = 0 (no buckling). */
  Fe: number | null;
  /** Flexural buckling stress, Eq. E3-2 or E3-3. */
  Fcr: number;
  /** φc Fcr with φc = 0.90 (design stress, LRFD); multiply by Ag for φc Pn (Eq. E3-1). */
  phiFcr: number;
  /** Fcr / Ωc with Ωc = 1.67 (allowable stress, ASD). */
  FcrOmega: number;
  equation: "E3-2" | "E3-3";
  /** 4.71 √(E/Fy), the KL/r at which E3-2 gives way to E3-3. */
  inelasticLimit: number;
  /** Advice that is not a requirement, e.g. KL/r over 200 (§E2 User Note). */
  warnings: string[];
  steps: Step[];
};

const schema = z.object({
  Fy: z.number().positive(),
  E: z.number().positive(),
  KLr: z.number().nonnegative(),
  units: unitsOptionSchema,
});

/**
 * Flexural buckling stress to AISC 360-16 §E3. Local buckling (slender elements,
 * Table B4.1a and §E7) and torsional modes (§E4) are outside this function.
 */
export function aisc360Compression(options: Aisc360CompressionOptions): Aisc360CompressionResult {
  const { Fy, E, KLr, units } = parseInput(schema, options);
  const u = resolveUnits(units, "kip-in");
  const f = AISC360_16;
  const inelasticLimit = 4.71 * Math.sqrt(E / Fy);
  const warnings: string[] = [];
  const steps: Step[] = [];

  let Fe: number | null = null;
  let Fcr: number;
  let equation: "E3-2" | "E3-3";
  if (KLr === 0) {
    // The limit of Eq. E3-2 as Fe → ∞ is Fy: a member that cannot buckle squashes.
    Fcr = Fy;
    equation = "E3-2";
    steps.push({
      latex: `\\frac{KL}{r} = 0 \\;\\Rightarrow\\; F_{cr} = F_y = ${texQty(Fy, u.stress)}`,
      text: "No buckling length: Eq. E3-2 tends to Fy as Fe grows without bound.",
    });
  } else {
    Fe = (Math.PI ** 2 * E) / KLr ** 2;
    steps.push({
      latex: `F_e = \\frac{\\pi^2 E}{(KL/r)^2} = \\frac{\\pi^2 \\times ${texQty(E, u.stress)}}{${texNum(KLr)}^2} = ${texQty(Fe, u.stress)}`,
      text: "Elastic buckling stress, AISC 360-16 Eq. E3-4.",
    });
    if (KLr <= inelasticLimit) {
      equation = "E3-2";
      Fcr = 0.658 ** (Fy / Fe) * Fy;
      steps.push({
        latex: `\\frac{KL}{r} = ${texNum(KLr)} \\le 4.71\\sqrt{E/F_y} = ${texNum(inelasticLimit)} \\;\\Rightarrow\\; F_{cr} = 0.658^{F_y/F_e} F_y = 0.658^{${texNum(Fy / Fe)}} \\times ${texQty(Fy, u.stress)} = ${texQty(Fcr, u.stress)}`,
        text: "Inelastic buckling, AISC 360-16 Eq. E3-2.",
      });
    } else {
      equation = "E3-3";
      Fcr = 0.877 * Fe;
      steps.push({
        latex: `\\frac{KL}{r} = ${texNum(KLr)} > 4.71\\sqrt{E/F_y} = ${texNum(inelasticLimit)} \\;\\Rightarrow\\; F_{cr} = 0.877 F_e = ${texQty(Fcr, u.stress)}`,
        text: "Elastic buckling, AISC 360-16 Eq. E3-3.",
      });
    }
  }

  const phiFcr = f.phiCompression * Fcr;
  const FcrOmega = Fcr / f.omegaCompression;
  steps.push({
    latex: `\\phi_c F_{cr} = 0.90 \\times ${texQty(Fcr, u.stress)} = ${texQty(phiFcr, u.stress)},\\quad F_{cr}/\\Omega_c = ${texQty(Fcr, u.stress)} / 1.67 = ${texQty(FcrOmega, u.stress)}`,
    text: "Available critical stress, AISC 360-16 §E1 (φc = 0.90, Ωc = 1.67); no slender elements assumed (Table B4.1a).",
  });

  if (KLr > f.compressionSlendernessLimit) {
    const message = `KL/r = ${Number(KLr.toPrecision(4))} exceeds 200, the preferred limit of AISC 360-16 §E2 User Note (common practice).`;
    warnings.push(message);
    steps.push({ latex: `\\frac{KL}{r} = ${texNum(KLr)} > 200`, text: `Warning: ${message}` });
  }

  return { Fe, Fcr, phiFcr, FcrOmega, equation, inelasticLimit, warnings, steps };
}
