import { SolveError } from "../errors";
import { texNum, texQty } from "../latex";
import type { Step } from "../types";
import type { CheckMemberResult, CheckNdsMember } from "./check-member-types";
import type { ResolvedSection } from "./member-section";
import { ndsColumnStability } from "./nds-column-stability";
import type { ResolvedUnits } from "./unit-labels";
import { utilizationStep } from "./utilization-step";

/** Tension (§3.8.1) or compression with column stability (§3.6.3, §3.7.1) of a solid timber member to NDS 2018. */
export function checkNdsMember(o: CheckNdsMember, section: ResolvedSection, u: ResolvedUnits): CheckMemberResult {
  const demand = Math.abs(o.force);
  const steps: Step[] = [...section.steps];

  if (o.force >= 0) {
    const An = o.An ?? section.A;
    const capacity = o.FtPrime * An;
    steps.push(
      {
        latex: `T' = F'_t A_n = ${texQty(o.FtPrime, u.stress)} \\times ${texQty(An, u.area)} = ${texQty(capacity, u.force)}`,
        text: "Adjusted tension capacity parallel to grain, NDS 2018 §3.8.1 (ft = T/An ≤ F't).",
      },
      utilizationStep(demand, capacity, "F'_t A_n", u.force),
    );
    return {
      mode: "tension",
      demand,
      capacity,
      utilization: demand / capacity,
      pass: demand <= capacity,
      governs: "NDS 2018 §3.8.1 (tension parallel to grain)",
      slenderness: o.length / section.rmin,
      warnings: [],
      steps,
    };
  }

  if (section.leastDimension === undefined) {
    throw new SolveError("INVALID", "section: timber compression needs a rectangular section (timber or rectangle shape) or properties with d", {
      path: "section",
    });
  }
  const K = o.K ?? 1;
  const le = K * o.length;
  steps.push({
    latex: `\\ell_e = K_e \\ell = ${texNum(K)} \\times ${texQty(o.length, u.length)} = ${texQty(le, u.length)}`,
    text: "Effective column length, NDS 2018 §3.7.1.2.",
  });
  const cs = ndsColumnStability({ FcStar: o.FcStar, EminPrime: o.EminPrime, le, d: section.leastDimension, c: o.c, units: u });
  const capacity = cs.FcPrime * section.A;
  steps.push(
    ...cs.steps,
    {
      latex: `P' = F'_c A = ${texQty(cs.FcPrime, u.stress)} \\times ${texQty(section.A, u.area)} = ${texQty(capacity, u.force)}`,
      text: "Adjusted compression capacity parallel to grain, NDS 2018 §3.6.3 (fc = P/A ≤ F'c).",
    },
    utilizationStep(demand, capacity, "F'_c A", u.force),
  );
  return {
    mode: "compression",
    demand,
    capacity,
    utilization: demand / capacity,
    pass: demand <= capacity,
    governs: "NDS 2018 §3.7.1, Eq. 3.7-1 (column stability)",
    slenderness: cs.slenderness,
    warnings: cs.warnings,
    steps,
  };
}
