import { z } from "zod";
import { texNum, texQty } from "../latex";
import type { Step } from "../types";
import { parseInput } from "./parse-input";
import { resolveUnits, unitsOptionSchema, type UnitsOption } from "./unit-labels";

/** Column parameter c by product, NDS 2018 §3.7.1. */
export const ndsColumnParameter = {
  /** Sawn lumber. */
  sawn: 0.8,
  /** Round timber poles and piles. */
  round: 0.85,
  /** Structural glued laminated timber or structural composite lumber. */
  glulam: 0.9,
} as const;

/** A product name of `ndsColumnParameter` or the value of c itself. */
export type NdsColumnParameter = keyof typeof ndsColumnParameter | number;

/**
 * Inputs of the NDS 2018 §3.7.1 column stability factor for a solid rectangular
 * column. Stresses in one unit (default label psi), lengths in another (in).
 */
export type NdsColumnStabilityOptions = {
  /** Fc*: reference compression design value parallel to grain times every adjustment factor except Cp. */
  FcStar: number;
  /** E'min: adjusted modulus of elasticity for stability calculations. */
  EminPrime: number;
  /** Effective column length le = Ke·l (≥ 0). */
  le: number;
  /** Cross-section dimension in the plane of buckling (the least dimension for the governing axis). */
  d: number;
  /** c = 0.8 sawn, 0.85 round poles and piles, 0.9 glulam or SCL. */
  c: NdsColumnParameter;
  units?: UnitsOption;
};

/** Column stability factor and the adjusted compression design value. */
export type NdsColumnStabilityResult = {
  /** le/d. */
  slenderness: number;
  /** True when le/d ≤ 50 (§3.7.1.4). */
  slendernessOk: boolean;
  /** FcE = 0.822 E'min/(le/d)²; null when le = 0. */
  FcE: number | null;
  /** c used. */
  c: number;
  /** Cp of Eq. 3.7-1 (1.0 when le = 0). */
  Cp: number;
  /** Fc' = Fc*·Cp. */
  FcPrime: number;
  warnings: string[];
  steps: Step[];
};

const schema = z.object({
  FcStar: z.number().positive(),
  EminPrime: z.number().positive(),
  le: z.number().nonnegative(),
  d: z.number().positive(),
  c: z.union([z.enum(["sawn", "round", "glulam"]), z.number().positive().max(1)]),
  units: unitsOptionSchema,
});

/** Cp to NDS 2018 Eq. 3.7-1 and the resulting Fc'. */
export function ndsColumnStability(options: NdsColumnStabilityOptions): NdsColumnStabilityResult {
  const input = parseInput(schema, options);
  const { FcStar, EminPrime, le, d } = input;
  const u = resolveUnits(input.units, "lb-in");
  const c = typeof input.c === "number" ? input.c : ndsColumnParameter[input.c];
  const slenderness = le / d;
  const slendernessOk = slenderness <= 50;
  const warnings: string[] = [];
  const steps: Step[] = [
    {
      latex: `\\frac{\\ell_e}{d} = \\frac{${texQty(le, u.length)}}{${texQty(d, u.length)}} = ${texNum(slenderness)} ${slendernessOk ? "\\le" : ">"} 50`,
      text: `Slenderness ratio, NDS 2018 §3.7.1.4 (le/d shall not exceed 50).`,
    },
  ];
  if (!slendernessOk) {
    warnings.push(`le/d = ${Number(slenderness.toPrecision(4))} exceeds 50, the limit of NDS 2018 §3.7.1.4 (75 during construction only).`);
  }

  let FcE: number | null = null;
  let Cp = 1;
  if (le === 0) {
    steps.push({ latex: `\\ell_e = 0 \\;\\Rightarrow\\; C_P = 1.0`, text: "No buckling length: the column stability factor is 1.0." });
  } else {
    FcE = (0.822 * EminPrime) / slenderness ** 2;
    const ratio = FcE / FcStar;
    const a = (1 + ratio) / (2 * c);
    const b = ratio / c;
    // Eq. 3.7-1 as written, a − √(a² − b), cancels badly for stocky columns
    // (a² ≫ b); b / (a + √(a² − b)) is the same number without the cancellation.
    Cp = b / (a + Math.sqrt(Math.max(a * a - b, 0)));
    steps.push(
      {
        latex: `F_{cE} = \\frac{0.822\\,E'_{min}}{(\\ell_e/d)^2} = \\frac{0.822 \\times ${texQty(EminPrime, u.stress)}}{${texNum(slenderness)}^2} = ${texQty(FcE, u.stress)}`,
        text: "Critical buckling design value, NDS 2018 §3.7.1.",
      },
      {
        latex: `C_P = \\frac{1 + F_{cE}/F_c^*}{2c} - \\sqrt{\\left[\\frac{1 + F_{cE}/F_c^*}{2c}\\right]^2 - \\frac{F_{cE}/F_c^*}{c}} = \\frac{1 + ${texNum(ratio)}}{2 \\times ${texNum(c)}} - \\sqrt{${texNum(a)}^2 - \\frac{${texNum(ratio)}}{${texNum(c)}}} = ${texNum(Cp)}`,
        text: `Column stability factor, NDS 2018 Eq. 3.7-1 (c = ${c}).`,
      },
    );
  }
  const FcPrime = FcStar * Cp;
  steps.push({
    latex: `F'_c = F_c^* C_P = ${texQty(FcStar, u.stress)} \\times ${texNum(Cp)} = ${texQty(FcPrime, u.stress)}`,
    text: "Adjusted compression design value parallel to grain, NDS 2018 §3.7.1.",
  });
  if (!slendernessOk) steps.push({ latex: `\\frac{\\ell_e}{d} > 50`, text: `Warning: ${warnings[0]}` });
  return { slenderness, slendernessOk, FcE, c, Cp, FcPrime, warnings, steps };
}
