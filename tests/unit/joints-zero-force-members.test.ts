import { describe, expect, it } from "vitest";
import { SolveError } from "@/lib/solve/errors";
import { zeroForceMembers } from "@/lib/solve/joints";
import { solveTruss } from "@/lib/solve/truss";
import { howe, pratt, trapezoid } from "./sections-trusses";

describe("zeroForceMembers", () => {
  it("lists each zero member once, with the rule and the joint that show it", () => {
    const model = pratt({ panels: 6, a: 3, h: 4, loads: [0, 10, 0, 10, 0] });
    const found = zeroForceMembers(model, { loadCase: "D" });
    expect(new Set(found.map((f) => f.member)).size).toBe(found.length);
    for (const f of found) {
      expect([1, 2]).toContain(f.rule);
      expect(f.description).toContain(`Joint ${f.joint}`);
    }
  });

  it("finds only members that the stiffness solution also has at zero", () => {
    for (const model of [
      pratt({ panels: 6, a: 3, h: 4, loads: [0, 10, 0, 10, 0] }),
      howe({ panels: 4, a: 3, h: 4, loads: [0, 10, 0] }),
      trapezoid(),
    ]) {
      const forces = solveTruss(model).cases.D.forces;
      for (const f of zeroForceMembers(model, { loadCase: "D" })) expect(Math.abs(forces[f.member])).toBeLessThan(1e-9);
    }
  });

  it("finds the Pratt hanger under an unloaded bottom joint by rule 2", () => {
    // L1 is unloaded: L0L1 and L1L2 are collinear there, so the vertical U1L1 carries nothing.
    const found = zeroForceMembers(pratt({ panels: 4, a: 3, h: 4, loads: [0, 10, 0] }), { loadCase: "D" });
    expect(found).toContainEqual(expect.objectContaining({ member: "U1L1", rule: 2, joint: "L1" }));
  });

  it("finds the midspan vertical of a Howe when the bottom joint under it is unloaded", () => {
    // In a Howe the diagonals meet at U2, so L2 has only the two chords and the vertical.
    const found = zeroForceMembers(howe({ panels: 4, a: 3, h: 4, loads: [10, 0, 10] }), { loadCase: "D" });
    expect(found).toContainEqual(expect.objectContaining({ member: "U2L2", rule: 2, joint: "L2" }));
  });

  it("does not call a member zero at a joint with more than three members", () => {
    // L1 of the pitched truss has five members: no rule applies however it is loaded.
    const model = trapezoid();
    model.loadCases[0].loads = [{ joint: "U1", fy: -12 }];
    expect(zeroForceMembers(model, { loadCase: "D" }).filter((f) => f.joint === "L1")).toEqual([]);
  });

  it("rejects a load case that is not in the model", () => {
    expect(() => zeroForceMembers(trapezoid(), { loadCase: "S" })).toThrow(SolveError);
  });
});
