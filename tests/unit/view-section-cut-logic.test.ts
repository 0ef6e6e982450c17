import { describe, expect, it } from "vitest";
import { cutProposals } from "@/components/editor/nodes/section-cut/cut-proposals";
import { describeCutMethod } from "@/components/editor/nodes/section-cut/describe-cut-method";
import { listPanels } from "@/components/editor/nodes/section-cut/list-panels";
import { readSectionCutDraft } from "@/components/editor/nodes/section-cut/section-cut-draft";
import { sectionCutSummary } from "@/components/editor/nodes/section-cut/section-cut-summary";
import { toggleCutMember } from "@/components/editor/nodes/section-cut/toggle-cut-member";
import { describeAgreement } from "@/components/editor/nodes/truss/describe-agreement";
import { trussCases, trussSources } from "@/components/editor/nodes/truss/truss-sources";
import type { CutMemberRow, SectionCutView } from "@/lib/calcs/section-cut/section-cut-view";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { demoCalcs, resultOf } from "./calcs-fixtures";

const evaluation = () => evaluateCalcs({ calcs: demoCalcs() });
const footbridge = () => {
  const t1 = trussSources(evaluation()).find((s) => s.label === "T1")?.value;
  if (!t1) throw new Error("the demo T1 does not solve");
  return t1;
};

describe("toggleCutMember", () => {
  it("adds a member, takes a cut one out, and past three lets the earliest pick go", () => {
    expect(toggleCutMember([], "U2U3")).toEqual(["U2U3"]);
    expect(toggleCutMember(["U2U3", "U2L3"], "U2U3")).toEqual(["U2L3"]);
    expect(toggleCutMember(["U2U3", "U2L3", "L2L3"], "U3L3")).toEqual(["U2L3", "L2L3", "U3L3"]);
  });
});

describe("readSectionCutDraft", () => {
  it("keeps what fits and drops what cannot be a member id", () => {
    expect(readSectionCutDraft({ truss: "T1", members: ["A", 3, "B"], panel: 2 })).toEqual({ truss: "T1", loadCase: "", members: ["A", "B"], keep: "", panel: 2 });
    expect(readSectionCutDraft(undefined)).toEqual({ truss: "", loadCase: "", members: [], keep: "" });
  });
});

describe("trussSources and trussCases", () => {
  it("list the Truss and Combinations calcs with their cases, combinations marked", () => {
    const sources = trussSources(evaluation());
    expect(sources.map((s) => [s.label, s.kind])).toEqual([["T1", "truss"], ["C1", "combinations"]]);
    expect(trussCases(sources[0].value).map((c) => c.label)).toEqual(["G", "Q"]);
    const c1 = trussCases(sources[1].value);
    expect(c1.at(-1)?.label).toMatch(/\(combination\)$/);
    expect(trussCases(null)).toEqual([]);
  });
});

describe("listPanels", () => {
  it("numbers the bottom chord's panels from 0 at the left", () => {
    const panels = listPanels(footbridge().model);
    expect(panels.map((p) => p.chord)).toEqual(["L0L1", "L1L2", "L2L3", "L3L4", "L4L5", "L5L6"]);
    expect(panels[2]).toMatchObject({ index: 2, x0: 8, x1: 12 });
  });
});

describe("cutProposals", () => {
  it("proposes the straight section through a panel first", () => {
    const { proposals, problem } = cutProposals(footbridge().model, 2);
    expect(problem).toBeNull();
    expect(proposals[0].members.sort()).toEqual(["L2L3", "U2L3", "U2U3"]);
    expect(proposals[0].straight).toBe(true);
  });

  it("turns a panel that does not exist into words", () => {
    expect(cutProposals(footbridge().model, 9).problem).toBe("Panel 9 does not exist: the bottom chord has 6 panels, numbered from 0.");
  });
});

describe("describeCutMethod", () => {
  const row: CutMemberRow = { member: "U2U3", force: -150, sense: "compression", method: "moment", pivot: { x: 12, y: 0 }, pivotKind: { kind: "joint", joint: "L3" }, stiffness: -150, agrees: true };

  it("names the moment point: a joint, a support, or a point off the truss", () => {
    expect(describeCutMethod(row, "m")).toBe("Moments about joint L3");
    expect(describeCutMethod({ ...row, pivotKind: { kind: "support", joint: "L0" } }, "m")).toBe("Moments about support L0");
    expect(describeCutMethod({ ...row, pivot: { x: -4, y: 0 }, pivotKind: { kind: "off-truss point" } }, "m")).toBe("Moments about (\u22124, 0) m, off the truss, where the other two lines of action meet");
    expect(describeCutMethod({ ...row, method: "force sum", pivot: null, pivotKind: null }, "m")).toBe("Force sum across the two parallel members");
  });
});

describe("describeAgreement", () => {
  it("says agreement within round-off, or flags the difference with both values", () => {
    expect(describeAgreement(-150, -150, true, "kN")).toEqual({ ok: true, text: "✓ Agrees with the stiffness solution within round-off" });
    expect(describeAgreement(-140, -150, false, "kN")).toEqual({ ok: false, text: "✕ Differs by 10 kN from the stiffness solution (\u2212150 kN)" });
    expect(describeAgreement(5, null, null, "kN").ok).toBeNull();
  });
});

describe("sectionCutSummary", () => {
  it("lists each cut force with T or C and the check against the truss", () => {
    const s1 = resultOf(evaluation(), "S1");
    // Q on the demo footbridge, section through panel 2 (statics): U2U3 = −450/3, U2L3 = 12.5/0.6, L2L3 = 400/3.
    expect(sectionCutSummary(s1.view as SectionCutView)).toBe("U2U3 = \u2212150 kN (C) · U2L3 = 20.83 kN (T) · L2L3 = 133.3 kN (T) · agrees with T1");
    expect(sectionCutSummary(null)).toBeUndefined();
  });
});
