/**
 * Source of the closed forms below: hand statics (equilibrium of free bodies, as taught in e.g.
 * Hibbeler, Structural Analysis, ch. 3) and, for deflections, the unit-load (virtual work) theorem.
 *
 * Joint deflections by virtual work against closed-form results. Units kN
 * and m throughout, so A is in m² and E in kN/m² (2×10⁸ kN/m² = 200 GPa).
 */
import { describe, expect, it } from "vitest";
import { deflection } from "@/lib/solve/deflection";
import type { TrussModel } from "@/lib/solve/types";
import { pratt4 } from "@/tests/unit/sections-trusses";

const E = 2e8;
const A = 0.001;

describe("deflection by virtual work", () => {
  it("gives PL/AE for a single bar pulled along its axis", () => {
    const bar: TrussModel = {
      joints: [{ id: "A", x: 0, y: 0 }, { id: "B", x: 4, y: 0 }],
      members: [{ id: "AB", start: "A", end: "B", A, E }],
      supports: [{ joint: "A", type: "pin" }, { joint: "B", type: "roller" }],
      loadCases: [{ id: "T", loads: [{ joint: "B", fx: 50 }] }],
    };
    const r = deflection(bar, { loadCase: "T", joint: "B", direction: "x" });
    expect(r.value).toBeCloseTo((50 * 4) / (A * E), 12); // Source: closed form — δ = PL/AE = 1.0 mm
    expect(r.agrees).toBe(true); // Source: closed form — virtual work and the stiffness method are exact for a linear truss
  });

  it("gives −PL/(2AE sin²α) at the apex of a symmetric two-bar truss", () => {
    const twoBar: TrussModel = {
      joints: [{ id: "A", x: -3, y: 0 }, { id: "B", x: 3, y: 0 }, { id: "C", x: 0, y: 4 }],
      members: [{ id: "AC", start: "A", end: "C", A, E }, { id: "BC", start: "B", end: "C", A, E }],
      supports: [{ joint: "A", type: "pin" }, { joint: "B", type: "pin" }],
      loadCases: [{ id: "P", loads: [{ joint: "C", fy: -10 }] }],
    };
    const r = deflection(twoBar, { loadCase: "P", joint: "C", direction: "y" });
    // Source: closed form — N = −P/(2 sin α), n = 1/(2 sin α), δ = 2·N·n·L/AE = −PL/(2AE sin²α), L = 5 m, sin α = 0.8
    expect(r.value).toBeCloseTo((-10 * 5) / (2 * A * E * 0.8 ** 2), 12);
    expect(r.terms.map((t) => t.n)).toEqual([expect.closeTo(0.625, 12), expect.closeTo(0.625, 12)]); // Source: closed form — 1/(2·0.8)
    expect(r.agrees).toBe(true); // Source: closed form — virtual work and the stiffness method are exact for a linear truss
  });

  it("gives PL/(AE(1 + 2cos³θ)) under the indeterminate three-bar truss", () => {
    const L = 3;
    const threeBar: TrussModel = {
      joints: [{ id: "A", x: -L, y: L }, { id: "B", x: 0, y: L }, { id: "C", x: L, y: L }, { id: "D", x: 0, y: 0 }],
      members: [{ id: "AD", start: "A", end: "D", A, E }, { id: "BD", start: "B", end: "D", A, E }, { id: "CD", start: "C", end: "D", A, E }],
      supports: [{ joint: "A", type: "pin" }, { joint: "B", type: "pin" }, { joint: "C", type: "pin" }],
      loadCases: [{ id: "P", loads: [{ joint: "D", fy: -100 }] }],
    };
    const r = deflection(threeBar, { loadCase: "P", joint: "D", direction: "y" });
    const c3 = Math.cos(Math.PI / 4) ** 3;
    // Source: closed form — compatibility of the three-bar truss (outer bars at θ = 45° to the middle bar of length L)
    expect(r.value).toBeCloseTo((-100 * L) / (A * E * (1 + 2 * c3)), 12);
    // Source: closed form — middle bar force P/(1 + 2cos³θ)
    expect(r.terms.find((t) => t.member === "BD")?.N).toBeCloseTo(100 / (1 + 2 * c3), 9);
    expect(r.agrees).toBe(true); // Source: closed form — virtual work and the stiffness method are exact for a linear truss
  });

  it("sums N·n·L/AE over the Pratt for its midspan deflection", () => {
    const r = deflection(pratt4(), { loadCase: "D", joint: "L2", direction: "y" });
    // Source: closed form — statics N and n (unit load up at L2): chords 4·11.25·(−0.375)·3 + 2·(−15)(0.75)·3,
    // end posts 2·(−18.75)(0.625)·5, diagonals 2·6.25·(−0.625)·5, verticals 0 → −274.375 kN·m, over AE = 4×10⁵ kN
    expect(r.value).toBeCloseTo(-274.375 / (0.002 * E), 12);
    expect(r.agrees).toBe(true); // Source: closed form — virtual work and the stiffness method are exact for a linear truss
  });

  it("gives the bottom-chord stretch as the horizontal movement of the roller", () => {
    const r = deflection(pratt4(), { loadCase: "D", joint: "L4", direction: "x" });
    // Source: closed form — a unit horizontal load at L4 is carried by the bottom chord alone: 4·11.25·3/AE
    expect(r.value).toBeCloseTo((4 * 11.25 * 3) / (0.002 * E), 12);
  });
});
