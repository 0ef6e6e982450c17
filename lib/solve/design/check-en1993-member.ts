import { texNum, texQty } from "../latex";
import type { Step } from "../types";
import type { CheckEn1993Member, CheckMemberResult } from "./check-member-types";
import { en1993CompressionResistance } from "./en1993-compression-resistance";
import { en1993TensionResistance } from "./en1993-tension-resistance";
import type { ResolvedSection } from "./member-section";
import type { ResolvedUnits } from "./unit-labels";
import { utilizationStep } from "./utilization-step";

/** Tension (§6.2.3) or flexural buckling (§6.3.1) of a steel member to EN 1993-1-1:2005. */
export function checkEn1993Member(o: CheckEn1993Member, section: ResolvedSection, u: ResolvedUnits): CheckMemberResult {
  const K = o.K ?? 1;
  const demand = Math.abs(o.force);
  const steps: Step[] = [...section.steps];

  if (o.force >= 0) {
    const t = en1993TensionResistance({
      A: section.A,
      fy: o.fy,
      Anet: o.Anet ?? section.A,
      fu: o.fu,
      gammaM0: o.gammaM0,
      gammaM2: o.gammaM2,
      units: u,
    });
    steps.push(...t.steps, utilizationStep(demand, t.NtRd, "N_{t,Rd}", u.force));
    return {
      mode: "tension",
      demand,
      capacity: t.NtRd,
      utilization: demand / t.NtRd,
      pass: demand <= t.NtRd,
      governs: t.governs === "yielding" ? "EN 1993-1-1 §6.2.3, Eq. 6.6 (gross-section yielding)" : "EN 1993-1-1 §6.2.3, Eq. 6.7 (net-section rupture)",
      slenderness: o.length / section.rmin,
      warnings: [],
      steps,
    };
  }

  const Lcr = K * o.length;
  steps.push({
    latex: `L_{cr} = K L = ${texNum(K)} \\times ${texQty(o.length, u.length)} = ${texQty(Lcr, u.length)}`,
    text: "Buckling length.",
  });
  const c = en1993CompressionResistance({ A: section.A, fy: o.fy, E: o.E, Lcr, i: section.rmin, curve: o.curve, gammaM1: o.gammaM1, units: u });
  steps.push(...c.steps, utilizationStep(demand, c.NbRd, "N_{b,Rd}", u.force));
  return {
    mode: "compression",
    demand,
    capacity: c.NbRd,
    utilization: demand / c.NbRd,
    pass: demand <= c.NbRd,
    governs: `EN 1993-1-1 §6.3.1.1, Eq. 6.47 (flexural buckling, curve ${o.curve})`,
    slenderness: Lcr / section.rmin,
    warnings: [],
    steps,
  };
}
