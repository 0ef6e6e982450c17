import { describe, expect, it } from "vitest";
import { readJointDraft } from "@/components/editor/nodes/joint/joint-draft";
import { jointSummary } from "@/components/editor/nodes/joint/joint-summary";
import { knownFromRows, knownRows } from "@/components/editor/nodes/joint/known-rows";
import { zeroForceInspection, zeroForceRuleName } from "@/components/editor/nodes/joint/zero-force-inspection";
import { trussSources } from "@/components/editor/nodes/truss/truss-sources";
import type { JointView } from "@/lib/calcs/joint/joint-view";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { demoCalcs, resultOf } from "./calcs-fixtures";

const evaluate = (calcs = demoCalcs()) => evaluateCalcs({ calcs });

describe("readJointDraft", () => {
  it("keeps finite known forces and reads anything else as a fresh calc", () => {
    expect(readJointDraft({ truss: "T1", joint: "L0", known: { L0L1: 83.3, bad: "x" }, sequence: false })).toEqual({ truss: "T1", loadCase: "", joint: "L0", known: { L0L1: 83.3 }, sequence: false });
    expect(readJointDraft(7)).toEqual({ truss: "", loadCase: "", joint: "", known: {}, sequence: false });
  });
});

describe("known force rows", () => {
  it("go to and from the stored record, leaving out rows not yet complete", () => {
    expect(knownRows({ L0L1: 83.3 })).toEqual([{ member: "L0L1", force: 83.3 }]);
    expect(knownFromRows([{ member: " L0L1 ", force: -5 }, { member: "", force: 3 }, { member: "U1L1" }])).toEqual({ known: { L0L1: -5 }, incomplete: 2 });
  });
});

describe("zeroForceInspection", () => {
  const t1 = () => {
    const v = trussSources(evaluate()).find((s) => s.label === "T1")?.value;
    if (!v) throw new Error("T1 does not solve");
    return v;
  };

  it("finds the midspan vertical of the Pratt footbridge by rule 2 at the unloaded top joint", () => {
    // Loads are on the bottom chord only, so U3 (top, unloaded) has U2U3 and U3U4 in line and U3L3 across them: common practice.
    const { members, problem } = zeroForceInspection(t1().model, "Q");
    expect(problem).toBeNull();
    expect(members).toEqual([expect.objectContaining({ member: "U3L3", rule: 2, joint: "U3" })]);
  });

  it("turns a case the truss does not have into words", () => {
    const { members, problem } = zeroForceInspection(t1().model, "W");
    expect(members).toEqual([]);
    expect(problem).toMatch(/W/);
  });

  it("names each rule in a few words", () => {
    expect(zeroForceRuleName(1)).toBe("Rule 1: two members not in line at an unloaded joint");
    expect(zeroForceRuleName(2)).toBe("Rule 2: three members, two in line, at an unloaded joint");
  });
});

describe("jointSummary", () => {
  it("lists the forces found at one joint with T or C and the check against the truss", () => {
    // L0 under Q (statics): R = 75 kN up, load 12.5 kN down; L0U1 = −62.5/0.6 = −104.2 kN, L0L1 = 0.8 × 104.2 = 83.33 kN.
    const j1 = resultOf(evaluate(), "J1");
    expect(jointSummary(j1.view as JointView)).toBe("Joint L0, case Q · L0L1 = 83.33 kN (T) · L0U1 = \u2212104.2 kN (C) · agrees with T1");
  });

  it("counts the joints and forces of a whole sequence", () => {
    const calcs = demoCalcs().map((c) => (c.label === "J1" ? { ...c, inputs: { truss: "T1", loadCase: "G", sequence: true } } : c));
    const view = resultOf(evaluate(calcs), "J1").view as JointView;
    expect(jointSummary(view)).toMatch(/^\d+ joints in order, 21 member forces, case G · agrees with T1$/);
    expect(jointSummary(null)).toBeUndefined();
  });
});
