import { describe, expect, it } from "vitest";
import { caseSteps } from "@/components/editor/nodes/truss/case-steps";
import { formatForce, senseWord } from "@/components/editor/nodes/truss/format-force";
import { trussSummary } from "@/components/editor/nodes/truss/truss-summary";
import type { TrussValue } from "@/lib/calcs/calc-types";
import type { TrussView } from "@/lib/calcs/truss/truss-view";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { demoCalc, demoCalcs, evaluateLast, resultOf, seedCalc } from "./calcs-fixtures";

const demoTruss = () => resultOf(evaluateCalcs({ calcs: demoCalcs() }), "T1");

describe("trussSummary", () => {
  it("states stability, determinacy and the extreme forces with their members and case", () => {
    // Q, 6.25 kN/m lumped at 4 m panels of the 24 m span, 3 m deep (statics): U2U3 = M(L3)/d = 450/3 = 150 kN compression,
    // L2L3 = M(U2)/d = (75 × 8 − 12.5 × 8 − 25 × 4)/3 = 133.3 kN tension.
    expect(trussSummary(demoTruss().view as TrussView)).toBe("Stable, determinate · max tension 133.3 kN (L2L3) · max compression −150 kN (U2U3) in case Q");
  });

  it("names the case on each extreme when they come from different cases", () => {
    const view = demoTruss().view as TrussView;
    const [g, q] = view.cases;
    const mixed: TrussView = { ...view, cases: [{ ...g, forces: g.forces.map((f) => (f.member === "U2U3" ? { ...f, force: -999 } : f)) }, q] };
    expect(trussSummary(mixed)).toBe("Stable, determinate · max tension 133.3 kN (L2L3, case Q) · max compression −999 kN (U2U3, case G)");
  });

  it("says what stops the truss being solved", () => {
    const unstable = evaluateLast(seedCalc("truss", { ...(demoCalc("T1").inputs as object), supports: [{ joint: "L0", type: "roller" }] }));
    expect(trussSummary(unstable.view as TrussView)).toBe("Unstable: see the message above.");
    expect(trussSummary(null)).toBe("Not solved: fix the marked inputs first.");
  });
});

describe("formatForce and senseWord", () => {
  it("print four significant figures with a true minus and the sense in words", () => {
    expect(formatForce(-104.16666, "kN")).toBe("\u2212104.2 kN");
    expect(formatForce(1234.5, "kip")).toBe("1235 kip");
    expect([senseWord("tension"), senseWord("compression"), senseWord("zero")]).toEqual(["tension (T)", "compression (C)", "zero force"]);
  });
});

describe("caseSteps", () => {
  it("uses the runtime's steps for the first case and writes them for another", () => {
    const t1 = demoTruss();
    const value = t1.exports.model as TrussValue;
    expect(caseSteps(value, t1.steps, "G")).toEqual(t1.steps);
    const q = caseSteps(value, t1.steps, "Q");
    expect(q).toHaveLength(3);
    // Q: 6.25 kN/m × 24 m = 150 kN, shared equally by the two supports (statics).
    expect(q[2].text).toContain("75 kN");
    expect(caseSteps(value, t1.steps, "nope")).toEqual([]);
  });
});
