/**
 * The hand methods must say so when the stiffness solution they are checked
 * against disagrees. The solver is replaced by one that returns a wrong force
 * for one member (and a wrong displacement for one joint), everything else
 * untouched.
 */
import { describe, expect, it, vi } from "vitest";
import { deflection } from "@/lib/solve/deflection";
import { jointEquilibrium } from "@/lib/solve/joints";
import { cutSection } from "@/lib/solve/sections";
import { pratt4 } from "./sections-trusses";

vi.mock("@/lib/solve/truss", async (importOriginal) => {
  const real = await importOriginal<typeof import("@/lib/solve/truss")>();
  return {
    ...real,
    solveTruss: (...args: Parameters<typeof real.solveTruss>) => {
      const solution = real.solveTruss(...args);
      const d = solution.cases.D;
      if (d) {
        d.forces.U1U2 = d.forces.U1U2 * 1.01;
        if (d.displacements?.L2) d.displacements.L2 = { ...d.displacements.L2, uy: d.displacements.L2.uy * 1.01 };
      }
      return solution;
    },
  };
});

describe("reporting a difference from the stiffness solution", () => {
  it("flags the one cut member that differs, in the result and in the steps", () => {
    const r = cutSection(pratt4(), { loadCase: "D", members: ["U1U2", "U1L2", "L1L2"], keep: "L0" });
    expect(r.agrees).toBe(false);
    expect(r.comparison.U1U2.agrees).toBe(false);
    expect(r.comparison.U1U2.difference).toBeCloseTo(0.15, 9);
    expect(r.comparison.L1L2.agrees).toBe(true);
    const flagged = r.steps.filter((s) => s.latex.includes("\\neq"));
    expect(flagged).toHaveLength(1);
    expect(flagged[0].text).toMatch(/U1U2: section gives -15 kN but the stiffness method gives -15.15 kN/);
  });

  it("flags a joint result that differs", () => {
    const r = jointEquilibrium(pratt4(), { loadCase: "D", joint: "U1", known: { L0U1: -18.75, U1L1: 10 } });
    expect(r.comparison.U1U2.agrees).toBe(false);
    expect(r.agrees).toBe(false);
  });

  it("flags a virtual-work deflection that differs from the stiffness displacement", () => {
    const r = deflection(pratt4(), { loadCase: "D", joint: "L2", direction: "y" });
    expect(r.agrees).toBe(false);
    expect(r.steps.some((s) => s.latex.includes("\\neq"))).toBe(true);
  });
});
