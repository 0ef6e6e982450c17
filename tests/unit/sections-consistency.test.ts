/**
 * The three ways of finding member forces must agree: method of sections
 * (every member some section can free), method of joints (every member), and
 * the stiffness solution. Checked on every determinate truss the hand-method
 * tests use and on generated parallel-chord trusses with random panel counts,
 * proportions and loads.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { solveByJoints } from "@/lib/solve/joints";
import { cutSection, proposeCuts } from "@/lib/solve/sections";
import { solveTruss } from "@/lib/solve/truss";
import type { TrussModel } from "@/lib/solve/types";
import { howe, pitchedHowe, pratt, pratt4, prism, trapezoid, triangle, warren } from "./sections-trusses";

function close(a: number, b: number, scale: number): boolean {
  return Math.abs(a - b) <= 1e-6 * Math.max(Math.abs(a), Math.abs(b), scale);
}

/** Checks all three methods on one model; returns how many members a section could free. */
function checkAgreement(model: TrussModel, known: Record<string, number> = {}): number {
  const stiffness = solveTruss(model).cases.D;
  const scale = Math.max(...model.loadCases[0].loads.map((l) => Math.max(Math.abs(l.fx ?? 0), Math.abs(l.fy ?? 0))));
  const joints = solveByJoints(model, { loadCase: "D", known });
  expect(joints.complete).toBe(true);
  let bySection = 0;
  for (const m of model.members) {
    expect(close(joints.forces[m.id], stiffness.forces[m.id], scale), `joints vs stiffness, ${m.id}`).toBe(true);
    const [cut] = proposeCuts(model, { member: m.id });
    if (!cut) continue;
    const section = cutSection(model, { loadCase: "D", members: cut.members, keep: cut.keep });
    expect(close(section.forces[m.id], stiffness.forces[m.id], scale), `section vs stiffness, ${m.id}`).toBe(true);
    expect(close(section.forces[m.id], joints.forces[m.id], scale), `section vs joints, ${m.id}`).toBe(true);
    bySection += 1;
  }
  return bySection;
}

describe("sections, joints and stiffness agree", () => {
  it.each([
    ["4-panel Pratt", pratt4()],
    ["4-panel Howe", howe({ panels: 4, a: 3, h: 4, loads: [10, 10, 10] })],
    ["pitched truss with end verticals", trapezoid()],
    ["pitched Howe", pitchedHowe()],
    ["3-4-5 triangle", triangle(10)],
    ["5-panel Warren", warren({ panels: 5, a: 3, h: 2.5, loads: [4, 8, 8, 4] })],
  ])("on the %s", (_, model) => {
    expect(checkAgreement(model)).toBeGreaterThan(0);
  });

  it("on the three-link prism, carrying one link force found by a section into the joints", () => {
    const link = cutSection(prism(), { loadCase: "D", members: ["AD", "BE", "CF"], keep: "D" });
    expect(link.agrees).toBe(true);
    expect(checkAgreement(prism(), { AD: link.forces.AD })).toBeGreaterThan(0);
  });

  it("on generated Pratt, Howe and Warren trusses with random panels, proportions and loads", () => {
    const shape = fc.record({
      kind: fc.constantFrom("pratt", "howe", "warren"),
      half: fc.integer({ min: 1, max: 4 }),
      a: fc.double({ min: 1, max: 6, noNaN: true }),
      h: fc.double({ min: 0.8, max: 5, noNaN: true }),
      loads: fc.array(fc.double({ min: -50, max: 50, noNaN: true }), { minLength: 8, maxLength: 8 }),
      side: fc.double({ min: -20, max: 20, noNaN: true }),
    });
    fc.assert(
      fc.property(shape, ({ kind, half, a, h, loads, side }) => {
        const panels = kind === "warren" ? half + 1 : 2 * half;
        const build = kind === "pratt" ? pratt : kind === "howe" ? howe : warren;
        const model = build({ panels, a, h, loads: loads.slice(0, panels - 1) });
        // A horizontal load at the first top joint makes the pin's horizontal reaction matter.
        model.loadCases[0].loads.push({ joint: "U1", fx: side, fy: -Math.abs(loads[7]) - 1 });
        checkAgreement(model);
      }),
      { numRuns: 40, seed: 20260 },
    );
  });
});
