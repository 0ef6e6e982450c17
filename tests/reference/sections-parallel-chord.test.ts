/**
 * Source of the closed forms below: hand statics (equilibrium of free bodies, as taught in e.g.
 * Hibbeler, Structural Analysis, ch. 3) and, for deflections, the unit-load (virtual work) theorem.
 *
 * Method of sections on 4-panel parallel-chord trusses with equal loads P at
 * the interior bottom joints: span 4a, depth h, a = 3 m, h = 4 m (so every
 * diagonal is 5 m, sin θ = 0.8), P = 10 kN. Expected values follow from the
 * beam analogy: each support carries 3P/2; a chord force is the bending
 * moment at the opposite panel point over the depth, M/h; a diagonal carries
 * the panel shear, V/sin θ.
 */
import katex from "katex";
import { describe, expect, it } from "vitest";
import { cutSection } from "@/lib/solve/sections";
import type { Member, TrussModel } from "@/lib/solve/types";

const a = 3;
const h = 4;
const P = 10;
const sinT = h / Math.hypot(a, h);

function parallelChord(diagonals: Array<[string, string]>): TrussModel {
  const bar = (s: string, e: string): Member => ({ id: `${s}${e}`, start: s, end: e, A: 0.002, E: 2e8 });
  return {
    joints: [
      ...[0, 1, 2, 3, 4].map((i) => ({ id: `L${i}`, x: i * a, y: 0 })),
      ...[1, 2, 3].map((i) => ({ id: `U${i}`, x: i * a, y: h })),
    ],
    members: [
      bar("L0", "L1"), bar("L1", "L2"), bar("L2", "L3"), bar("L3", "L4"), bar("U1", "U2"), bar("U2", "U3"),
      bar("L0", "U1"), bar("U3", "L4"), bar("U1", "L1"), bar("U2", "L2"), bar("U3", "L3"),
      ...diagonals.map(([s, e]) => bar(s, e)),
    ],
    supports: [{ joint: "L0", type: "pin" }, { joint: "L4", type: "roller" }],
    loadCases: [{ id: "D", loads: [1, 2, 3].map((i) => ({ joint: `L${i}`, fy: -P })) }],
  };
}

const prattTruss = parallelChord([["U1", "L2"], ["U3", "L2"]]);
const howeTruss = parallelChord([["L1", "U2"], ["L3", "U2"]]);

describe("4-panel Pratt truss, P at L1, L2, L3", () => {
  it("finds the panel-2 members from moments about U1 and L2 and a vertical force sum", () => {
    const r = cutSection(prattTruss, { loadCase: "D", members: ["U1U2", "U1L2", "L1L2"], keep: "L0" });
    // Source: closed form — reactions 3P/2 = 15 kN each (symmetry)
    expect(r.externalForces.find((f) => f.kind === "reaction")?.fy).toBeCloseTo((3 * P) / 2, 9);
    // Source: closed form — M at U1 = (3P/2)·a = 45 kN·m; L1L2 = M/h = 11.25 kN (tension)
    expect(r.forces.L1L2).toBeCloseTo(((3 * P) / 2) * a / h, 9);
    // Source: closed form — M at L2 = (3P/2)·2a − P·a = 2Pa = 60 kN·m; U1U2 = −M/h = −15 kN (compression)
    expect(r.forces.U1U2).toBeCloseTo(-(2 * P * a) / h, 9);
    // Source: closed form — shear in panel 2 V = 3P/2 − P = P/2; U1L2 = V/sin θ = 6.25 kN (tension in a Pratt)
    expect(r.forces.U1L2).toBeCloseTo(P / 2 / sinT, 9);
    // Source: closed form — U1U2 and U1L2 meet at U1; U1L2 and L1L2 meet at L2; the chords are parallel (no moment point)
    expect(r.pivotKind).toEqual({ L1L2: { kind: "joint", joint: "U1" }, U1U2: { kind: "joint", joint: "L2" }, U1L2: null });
    expect(r.agrees).toBe(true); // Source: closed form — a determinate truss has one set of forces, so the stiffness solution matches
  });

  it("gives the midspan top chord as −M/h with M = 2Pa, keeping the right-hand side", () => {
    const r = cutSection(prattTruss, { loadCase: "D", members: ["U2U3", "U3L2", "L2L3"], keep: "L4" });
    expect(r.forces.U2U3).toBeCloseTo(-15, 9); // Source: closed form — −2Pa/h = −2·10·3/4
    expect(r.forces.U3L2).toBeCloseTo(6.25, 9); // Source: closed form — (P/2)/0.8
    expect(r.forces.L2L3).toBeCloseTo(11.25, 9); // Source: closed form — (3P/2)·a/h
    expect(r.keptJoints.sort()).toEqual(["L3", "L4", "U3"]); // Source: closed form — the joints right of the cut
  });

  it("finds the end post and the first vertical with the end panel cut obliquely", () => {
    const r = cutSection(prattTruss, { loadCase: "D", members: ["L0U1", "U1L1", "L1L2"], keep: "L0" });
    expect(r.forces.L0U1).toBeCloseTo(-((3 * P) / 2) / sinT, 9); // Source: closed form — −R/sin θ = −18.75 kN
    expect(r.forces.U1L1).toBeCloseTo(P, 9); // Source: closed form — the hanger carries its panel load P (ΣFy at L1)
    expect(r.pivotKind.U1L1).toEqual({ kind: "support", joint: "L0" }); // Source: closed form — L0U1 and L1L2 meet at the pin L0
  });

  it("writes every step so that KaTeX renders it", () => {
    const r = cutSection(prattTruss, { loadCase: "D", members: ["U1U2", "U1L2", "L1L2"], keep: "L0" });
    for (const s of r.steps) expect(() => katex.renderToString(s.latex, { throwOnError: true })).not.toThrow();
  });
});

describe("4-panel Howe truss, P at L1, L2, L3", () => {
  it("has its panel-2 diagonal in compression, −V/sin θ, and chords from M/h", () => {
    const r = cutSection(howeTruss, { loadCase: "D", members: ["U1U2", "L1U2", "L1L2"], keep: "L0" });
    expect(r.forces.L1U2).toBeCloseTo(-(P / 2) / sinT, 9); // Source: closed form — −(P/2)/0.8 = −6.25 kN
    expect(r.forces.U1U2).toBeCloseTo(-((3 * P) / 2) * a / h, 9); // Source: closed form — −M(L1)/h = −11.25 kN
    expect(r.forces.L1L2).toBeCloseTo((2 * P * a) / h, 9); // Source: closed form — M(U2)/h = 15 kN
    expect(r.pivotKind.U1U2).toEqual({ kind: "joint", joint: "L1" }); // Source: closed form — L1U2 and L1L2 meet at L1
    expect(r.pivotKind.L1L2).toEqual({ kind: "joint", joint: "U2" }); // Source: closed form — U1U2 and L1U2 meet at U2
    expect(r.agrees).toBe(true); // Source: closed form — determinate, so the stiffness solution matches
  });
});
