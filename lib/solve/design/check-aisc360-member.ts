import { texNum, texQty } from "../latex";
import type { Step } from "../types";
import { AISC360_16 } from "./aisc360-factors";
import { aisc360Compression } from "./aisc360-compression";
import { aisc360Tension } from "./aisc360-tension";
import type { CheckAisc360Member, CheckMemberResult } from "./check-member-types";
import type { ResolvedSection } from "./member-section";
import type { ResolvedUnits } from "./unit-labels";
import { utilizationStep } from "./utilization-step";

/** Tension (§D2) or flexural buckling (§E3) of a steel member to AISC 360-16. */
export function checkAisc360Member(o: CheckAisc360Member, section: ResolvedSection, u: ResolvedUnits): CheckMemberResult {
  const K = o.K ?? 1;
  const asd = o.method === "ASD";
  const demand = Math.abs(o.force);
  const steps: Step[] = [...section.steps];
  const warnings: string[] = [];

  if (o.force >= 0) {
    const Lr = o.length / section.rmin;
    const t = aisc360Tension({ Fy: o.Fy, Fu: o.Fu, Ag: section.A, An: o.An ?? section.A, U: o.U ?? 1, units: u });
    steps.push(...t.steps);
    if (Lr > AISC360_16.tensionSlendernessLimit) {
      const message = `L/r = ${Number(Lr.toPrecision(4))} exceeds 300, the preferred limit of AISC 360-16 §D1 User Note (common practice).`;
      warnings.push(message);
      steps.push({ latex: `\\frac{L}{r} = ${texNum(Lr)} > 300`, text: `Warning: ${message}` });
    }
    const capacity = asd ? t.asd.PnOmega : t.phiPn;
    const governs = asd ? t.asd.governs : t.governs;
    steps.push(utilizationStep(demand, capacity, asd ? "P_n/\\Omega_t" : "\\phi_t P_n", u.force));
    return {
      mode: "tension",
      demand,
      capacity,
      utilization: demand / capacity,
      pass: demand <= capacity,
      governs: governs === "yielding" ? "AISC 360-16 §D2(a), Eq. D2-1 (tensile yielding)" : "AISC 360-16 §D2(b), Eq. D2-2 (tensile rupture)",
      slenderness: Lr,
      warnings,
      steps,
    };
  }

  const KLr = (K * o.length) / section.rmin;
  steps.push({
    latex: `\\frac{KL}{r} = \\frac{${texNum(K)} \\times ${texQty(o.length, u.length)}}{${texQty(section.rmin, u.length)}} = ${texNum(KLr)}`,
    text: "Slenderness about the least radius of gyration.",
  });
  const c = aisc360Compression({ Fy: o.Fy, E: o.E, KLr, units: u });
  steps.push(...c.steps);
  warnings.push(...c.warnings);
  const capacity = (asd ? c.FcrOmega : c.phiFcr) * section.A;
  steps.push({
    latex: `${asd ? "P_n/\\Omega_c = F_{cr} A_g / 1.67" : "\\phi_c P_n = \\phi_c F_{cr} A_g"} = ${texQty(asd ? c.FcrOmega : c.phiFcr, u.stress)} \\times ${texQty(section.A, u.area)} = ${texQty(capacity, u.force)}`,
    text: `${asd ? "Allowable" : "Design"} compressive strength, AISC 360-16 Eq. E3-1.`,
  });
  steps.push(utilizationStep(demand, capacity, asd ? "P_n/\\Omega_c" : "\\phi_c P_n", u.force));
  return {
    mode: "compression",
    demand,
    capacity,
    utilization: demand / capacity,
    pass: demand <= capacity,
    governs: `AISC 360-16 §E3, Eq. ${c.equation} (flexural buckling)`,
    slenderness: KLr,
    warnings,
    steps,
  };
}
