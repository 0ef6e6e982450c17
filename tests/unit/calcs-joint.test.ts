import { describe, expect, it } from "vitest";
import { calcDefaults } from "@/lib/calcs/calc-defaults";
import type { JointView } from "@/lib/calcs/joint/joint-view";
import { demoCalc, evaluateLast, seedCalc, valueOf } from "./calcs-fixtures";

const joint = (inputs: Record<string, unknown>) => seedCalc("joint", { truss: "T1", loadCase: "Q", ...inputs }, "J9");

describe("Joint calc", () => {
  it("works a new calc's default, the whole truss joint by joint, to completion", () => {
    const r = evaluateLast(seedCalc("truss", calcDefaults("truss")), seedCalc("joint", calcDefaults("joint")));
    expect(r.status).toBe("ok");
    const view = r.view as JointView;
    expect(view.mode).toBe("sequence");
    if (view.mode === "sequence") {
      expect(view.complete).toBe(true);
      expect(view.agrees).toBe(true);
      expect(view.rows).toHaveLength(17);
    }
  });

  it("balances the support joint L0 with the reaction carried in", () => {
    const r = evaluateLast(demoCalc("T1"), joint({ joint: "L0" }));
    // R = 75 kN less the 12.5 kN panel load at L0 goes up the end post (sin θ = 0.6); its horizontal part (cos θ = 0.8) into L0L1.
    expect(valueOf(r, "F_L0U1")).toBeCloseTo(-62.5 / 0.6, 6);
    expect(valueOf(r, "F_L0L1")).toBeCloseTo((62.5 / 0.6) * 0.8, 6);
    const view = r.view as JointView;
    expect(view.mode === "joint" && view.balanced && view.agrees).toBe(true);
  });

  it("carries known member forces into the joint", () => {
    const r = evaluateLast(demoCalc("T1"), joint({ joint: "L1", known: { L0L1: (62.5 / 0.6) * 0.8 } }));
    expect(valueOf(r, "F_U1L1")).toBeCloseTo(25, 6);
    expect(valueOf(r, "F_L1L2")).toBeCloseTo((62.5 / 0.6) * 0.8, 6);
  });

  it("reports a joint with more unknowns than two equations can find on the joint field", () => {
    const r = evaluateLast(demoCalc("T1"), joint({ joint: "U2" }));
    expect(r.status).toBe("error");
    expect(r.fieldErrors[0].path).toBe("joint");
    expect(r.fieldErrors[0].message).toMatch(/4 unknown member forces/);
  });

  it("asks for a joint when neither a joint nor a sequence is chosen", () => {
    const r = evaluateLast(demoCalc("T1"), joint({ sequence: false }));
    expect(r.fieldErrors).toEqual([{ path: "joint", message: expect.stringContaining("choose a joint") }]);
  });

  it("reports a known force on a member the truss does not have on that entry", () => {
    const r = evaluateLast(demoCalc("T1"), joint({ joint: "L0", known: { X1: 3 } }));
    expect(r.fieldErrors[0].path).toBe("known.X1");
  });
});
