/**
 * Source of the closed forms below: hand statics (equilibrium of free bodies, as taught in e.g.
 * Hibbeler, Structural Analysis, ch. 3) and, for deflections, the unit-load (virtual work) theorem.
 *
 * Method of joints on trusses whose member forces follow from statics by
 * hand: a 3-4-5 triangle and the 4-panel Pratt (a = 3 m, h = 4 m, 10 kN at
 * L1–L3; diagonals 5 m, sin θ = 0.8, cos θ = 0.6).
 */
import katex from "katex";
import { describe, expect, it } from "vitest";
import { jointEquilibrium, solveByJoints } from "@/lib/solve/joints";
import { pratt4, triangle } from "@/tests/unit/sections-trusses";

describe("method of joints", () => {
  it("solves the heel of a 3-4-5 triangle from its reaction", () => {
    const r = jointEquilibrium(triangle(10), { loadCase: "D", joint: "A" });
    // Source: closed form — R = P/2 = 5 kN; ΣFy: 5 + 0.8·F_AC = 0 → F_AC = −6.25 kN
    expect(r.forces.AC).toBeCloseTo(-6.25, 10);
    // Source: closed form — ΣFx: F_AB + 0.6·F_AC = 0 → F_AB = 3.75 kN
    expect(r.forces.AB).toBeCloseTo(3.75, 10);
    expect(r.agrees).toBe(true); // Source: closed form — determinate, so the stiffness solution matches
  });

  it("solves the Pratt joint by joint with the closed-form forces", () => {
    const r = solveByJoints(pratt4(), { loadCase: "D" });
    expect(r.complete).toBe(true); // Source: closed form — a simple truss, built joint by joint, is solvable joint by joint
    expect(r.forces.L0U1).toBeCloseTo(-18.75, 9); // Source: closed form — −(3P/2)/sin θ
    expect(r.forces.L0L1).toBeCloseTo(11.25, 9); // Source: closed form — (3P/2)/tan θ
    expect(r.forces.U1L1).toBeCloseTo(10, 9); // Source: closed form — hanger at L1 carries P
    expect(r.forces.U1L2).toBeCloseTo(6.25, 9); // Source: closed form — (P/2)/sin θ
    expect(r.forces.U1U2).toBeCloseTo(-15, 9); // Source: closed form — −2Pa/h
    expect(r.forces.U2L2).toBe(0); // Source: closed form — zero-force member (rule 2 at U2)
    expect(r.agrees).toBe(true); // Source: closed form — determinate, so the stiffness solution matches
  });

  it("carries the end post into joint U1 and finds the top chord and diagonal", () => {
    const r = jointEquilibrium(pratt4(), { loadCase: "D", joint: "U1", known: { L0U1: -18.75, U1L1: 10 } });
    // Source: closed form — ΣFy at U1: 18.75·0.8 − 10 − 0.8·F = 0 → F_U1L2 = 6.25 kN
    expect(r.forces.U1L2).toBeCloseTo(6.25, 10);
    // Source: closed form — ΣFx at U1: 18.75·0.6 + F_U1U2 + 0.6·6.25 = 0 → F_U1U2 = −15 kN
    expect(r.forces.U1U2).toBeCloseTo(-15, 10);
    for (const s of r.steps) expect(() => katex.renderToString(s.latex, { throwOnError: true })).not.toThrow();
  });
});
