import katex from "katex";
import { describe, expect, it } from "vitest";
import { SolveError } from "@/lib/solve/errors";
import { solveByJoints } from "@/lib/solve/joints";
import { cutSection } from "@/lib/solve/sections";
import { pratt4, prattWithCounter, prism, warren } from "./sections-trusses";

describe("solveByJoints", () => {
  it("finds every member force of a determinate truss, in agreement with the stiffness method", () => {
    const model = warren({ panels: 5, a: 3, h: 2.5, loads: [4, 8, 8, 4] });
    const r = solveByJoints(model, { loadCase: "D" });
    expect(r.complete).toBe(true);
    expect(Object.keys(r.forces).sort()).toEqual(model.members.map((m) => m.id).sort());
    expect(r.agrees).toBe(true);
  });

  it("takes each joint when it has at most two unknowns, starting at a support", () => {
    const r = solveByJoints(pratt4(), { loadCase: "D" });
    expect(r.order[0]).toBe("L0");
    for (const j of r.joints) expect(j.unknowns.length).toBeLessThanOrEqual(2);
    expect(new Set(r.order).size).toBe(r.order.length);
  });

  it("uses the joints left over as checks that balance", () => {
    const r = solveByJoints(pratt4(), { loadCase: "D" });
    const visited = new Set([...r.order, ...r.checks.map((c) => c.joint)]);
    expect(visited.size).toBe(8);
    for (const c of r.checks) expect(c.balanced).toBe(true);
  });

  it("stops on an indeterminate truss and says so", () => {
    const r = solveByJoints(prattWithCounter(), { loadCase: "D" });
    expect(r.complete).toBe(false);
    expect(r.stuck?.reason).toBe("indeterminate");
    expect(r.stuck?.members).toEqual(expect.arrayContaining(["U1L2", "U2L1"]));
    expect(r.stuck?.message).toMatch(/statically indeterminate/);
    expect(r.agrees).toBe(false);
  });

  it("stops where a determinate truss needs a section, and carries on from a section's result", () => {
    const stuck = solveByJoints(prism(), { loadCase: "D" });
    expect(stuck.complete).toBe(false);
    expect(stuck.order).toEqual([]);
    expect(stuck.stuck?.reason).toBe("needs a section");
    expect(stuck.stuck?.joints.every((j) => j.unknowns === 3)).toBe(true);
    const links = cutSection(prism(), { loadCase: "D", members: ["AD", "BE", "CF"], keep: "D" });
    const resumed = solveByJoints(prism(), { loadCase: "D", known: { AD: links.forces.AD } });
    expect(resumed.complete).toBe(true);
    expect(resumed.agrees).toBe(true);
  });

  it("writes a header, the equations of each joint and a comparison per member, all renderable", () => {
    const r = solveByJoints(pratt4(), { loadCase: "D" });
    for (const s of r.steps) expect(() => katex.renderToString(s.latex, { throwOnError: true })).not.toThrow();
    expect(r.steps.filter((s) => s.latex.startsWith("\\text{Joint }"))).toHaveLength(8);
    expect(r.steps.filter((s) => s.latex.includes("(stiffness)"))).toHaveLength(13);
  });

  it("rejects a known force for a member that does not exist", () => {
    expect(() => solveByJoints(pratt4(), { loadCase: "D", known: { ZZ: 1 } })).toThrow(SolveError);
  });
});
