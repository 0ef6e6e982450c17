import { describe, expect, it } from "vitest";
import { calcDefaults } from "@/lib/calcs/calc-defaults";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import type { SectionCutView } from "@/lib/calcs/section-cut/section-cut-view";
import { demoCalc, demoCalcs, evaluateLast, resultOf, seedCalc, valueOf } from "./calcs-fixtures";

const cut = (inputs: Record<string, unknown>) => seedCalc("sectionCut", { truss: "T1", loadCase: "Q", members: ["U2U3", "U2L3", "L2L3"], keep: "L0", ...inputs }, "S9");

describe("Section cut calc", () => {
  it("proposes and solves a cut when a new calc starts with no members picked", () => {
    const r = evaluateLast(seedCalc("truss", calcDefaults("truss")), seedCalc("sectionCut", calcDefaults("sectionCut")));
    expect(r.status).toBe("ok");
    const view = r.view as SectionCutView;
    expect(view.proposed).toBe(true);
    expect(view.members).toHaveLength(3);
    expect(view.description).toMatch(/^Cut /);
    expect(view.agrees).toBe(true);
  });

  it("finds the forces of the panel left of midspan as statics gives them by hand", () => {
    const r = evaluateLast(demoCalc("T1"), cut({}));
    // Q = 6.25 kN/m, R = 75 kN. About L3 (x = 12): M = 75·12 − 6.25·12²/2 = 450 → U2U3 = −450/3.
    expect(valueOf(r, "F_U2U3")).toBeCloseTo(-150, 6);
    // About U2 (x = 8): M = 75·8 − 6.25·8²/2 = 400 → L2L3 = 400/3.
    expect(valueOf(r, "F_L2L3")).toBeCloseTo(400 / 3, 6);
    // Shear in the panel 75 − 12.5 − 25 − 25 = 12.5, taken by the diagonal at sin θ = 3/5.
    expect(valueOf(r, "F_U2L3")).toBeCloseTo(12.5 / 0.6, 6);
    const view = r.view as SectionCutView;
    expect(view.keptJoints).toEqual(["L0", "L1", "L2", "U1", "U2"]);
    expect(view.rows.map((row) => [row.member, row.sense, row.method])).toEqual([
      ["U2U3", "compression", "moment"],
      ["U2L3", "tension", "force sum"],
      ["L2L3", "tension", "moment"],
    ]);
    expect(view.rows.every((row) => row.agrees)).toBe(true);
  });

  it("works on a combination when it reads a Combinations calc", () => {
    const calcs = demoCalcs().filter((c) => ["T1", "C1"].includes(c.label));
    const r = evaluateLast(...calcs, cut({ truss: "C1", loadCase: "(6.10) 1.35G + 1.5Q" }));
    expect(r.status).toBe("ok");
    expect(valueOf(r, "F_U2U3")).toBeCloseTo(1.35 * -72 + 1.5 * -150, 6);
  });

  it("reports a member that is not in the truss on its place in the list", () => {
    const r = evaluateLast(demoCalc("T1"), cut({ members: ["U2U3", "U9L9", "L2L3"] }));
    expect(r.status).toBe("error");
    expect(r.fieldErrors).toEqual([{ path: "members[1]", message: expect.stringContaining("U9L9") }]);
  });

  it("reports a load case the truss does not have, listing those it has", () => {
    const r = evaluateLast(demoCalc("T1"), cut({ loadCase: "W" }));
    expect(r.fieldErrors[0].path).toBe("loadCase");
    expect(r.fieldErrors[0].message).toContain("G, Q");
  });

  it("reports a cut that does not separate the truss on the members field", () => {
    const r = evaluateLast(demoCalc("T1"), cut({ members: ["U2U3", "L2L3"] }));
    expect(r.status).toBe("error");
    expect(r.fieldErrors[0].path).toBe("members");
  });

  it("shows a reference to a calc that is not a truss as a broken reference", () => {
    const formula = seedCalc("formula", { source: "a = 1 m" }, "F1");
    const evaluation = evaluateCalcs({ calcs: [formula, cut({ truss: "F1" })] });
    const r = resultOf(evaluation, "S9");
    expect(r.status).toBe("error");
    expect(r.messages[0]).toBe("Broken reference: F1 is not a Truss or Combinations calc, so it has no truss to read.");
  });
});
