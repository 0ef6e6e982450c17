import { describe, expect, it } from "vitest";
import { solveTruss } from "@/lib/solve/truss";
import type { TrussModel } from "@/lib/solve/types";

/**
 * A parallel-chord Pratt truss with end verticals: bottom joints L0…Ln, top
 * joints U0…Un, panel length p, depth h, diagonals falling towards
 * mid-span (U_i–L_{i+1} in the left half), pin at L0, roller at Ln, load P
 * down at each interior bottom joint. Built here, not by the product's
 * generators, so that the reference does not lean on the code under test.
 */
function pratt(n: number, p: number, h: number, P: number, section: { A?: number; E?: number } = {}): TrussModel {
  const joints = [];
  const members = [];
  for (let i = 0; i <= n; i++) joints.push({ id: `L${i}`, x: i * p, y: 0 }, { id: `U${i}`, x: i * p, y: h });
  for (let i = 0; i < n; i++) {
    members.push({ id: `L${i}L${i + 1}`, start: `L${i}`, end: `L${i + 1}`, ...section });
    members.push({ id: `U${i}U${i + 1}`, start: `U${i}`, end: `U${i + 1}`, ...section });
    members.push(i < n / 2 ? { id: `D${i}`, start: `U${i}`, end: `L${i + 1}`, ...section } : { id: `D${i}`, start: `L${i}`, end: `U${i + 1}`, ...section });
  }
  for (let i = 0; i <= n; i++) members.push({ id: `L${i}U${i}`, start: `L${i}`, end: `U${i}`, ...section });
  const loads = [];
  for (let i = 1; i < n; i++) loads.push({ joint: `L${i}`, fy: -P });
  return {
    joints,
    members,
    supports: [{ joint: "L0", type: "pin" }, { joint: `L${n}`, type: "roller" }],
    loadCases: [{ id: "P", loads }],
  };
}

describe("parallel-chord Pratt truss under equal panel loads (n = 6, p = 4 m, h = 3 m, P = 20 kN)", () => {
  const n = 6, p = 4, h = 3, P = 20;
  const result = solveTruss(pratt(n, p, h, P)).cases.P;
  const R = ((n - 1) * P) / 2; // closed form: symmetry, ΣFy = 0
  const M = (i: number) => R * i * p - (P * p * i * (i - 1)) / 2; // closed form: bending moment of the equivalent simply supported beam at panel point i
  const sin = h / Math.hypot(p, h);

  it("carries half the total load at each support", () => {
    expect(result.reactions.L0.ry).toBeCloseTo(R, 9); // closed form: ΣM about L6 = 0
    expect(result.reactions.L6.ry).toBeCloseTo(R, 9); // closed form: ΣFy = 0
    expect(result.reactions.L0.rx).toBe(0); // closed form: no horizontal load
  });

  it("gives each bottom chord the tension M/h at the panel point opposite", () => {
    for (let i = 0; i < n / 2; i++) expect(result.forces[`L${i}L${i + 1}`]).toBeCloseTo(M(i) / h, 9); // Source: Hibbeler, Structural Analysis, ch. 3, method of sections (moments about U_i)
  });

  it("gives each top chord the compression M/h at the far panel point", () => {
    for (let i = 0; i < n / 2; i++) expect(result.forces[`U${i}U${i + 1}`]).toBeCloseTo(-M(i + 1) / h, 9); // Source: Hibbeler, Structural Analysis, ch. 3, method of sections (moments about L_{i+1})
  });

  it("gives each diagonal the tension V/sin θ", () => {
    for (let i = 0; i < n / 2; i++) expect(result.forces[`D${i}`]).toBeCloseTo((R - i * P) / sin, 9); // Source: Hibbeler, Structural Analysis, ch. 3, method of sections (ΣFy on the cut)
  });

  it("gives the verticals iP − R and the unloaded mid-span vertical nothing", () => {
    for (let i = 1; i < n / 2; i++) expect(result.forces[`L${i}U${i}`]).toBeCloseTo(i * P - R, 9); // closed form: method of joints, ΣFy at L_i
    expect(result.forces.L0U0).toBeCloseTo(-R, 9); // closed form: method of joints, ΣFy at L0
    expect(result.forces.L3U3).toBe(0); // closed form: method of joints at U3, no diagonal and no load
  });

  it("is symmetric about mid-span", () => {
    expect(result.forces.L5L6).toBeCloseTo(result.forces.L0L1, 9); // closed form: symmetry
    expect(result.forces.D5).toBeCloseTo(result.forces.D0, 9); // closed form: symmetry
  });
});

describe("two-bar symmetric truss under a vertical load at the apex", () => {
  // A(−3, 0) and B(3, 0) pinned, apex C(0, 4): sin θ = 0.8, bar length 5 m.
  const P = 100, A = 0.002, E = 2e8;
  const model: TrussModel = {
    joints: [{ id: "A", x: -3, y: 0 }, { id: "B", x: 3, y: 0 }, { id: "C", x: 0, y: 4 }],
    members: [{ id: "AC", start: "A", end: "C", A, E }, { id: "BC", start: "B", end: "C", A, E }],
    supports: [{ joint: "A", type: "pin" }, { joint: "B", type: "pin" }],
    loadCases: [{ id: "P", loads: [{ joint: "C", fy: -P }] }],
  };
  const result = solveTruss(model).cases.P;

  it("puts each bar in compression N = P / (2 sin θ)", () => {
    expect(result.forces.AC).toBeCloseTo(-62.5, 9); // closed form: N = P/(2 sin θ) = 100/(2·0.8)
    expect(result.forces.BC).toBeCloseTo(-62.5, 9); // closed form: symmetry
  });

  it("pushes each support outwards by N cos θ and up by P/2", () => {
    expect(result.reactions.A.rx).toBeCloseTo(37.5, 9); // closed form: 62.5 · 0.6
    expect(result.reactions.B.rx).toBeCloseTo(-37.5, 9); // closed form: 62.5 · 0.6, opposite
    expect(result.reactions.A.ry).toBeCloseTo(50, 9); // closed form: P/2
  });

  it("lowers the apex by P L / (2 A E sin² θ)", () => {
    expect(result.displacements?.C.uy).toBeCloseTo(-(P * 5) / (2 * A * E * 0.64), 14); // closed form: shortening N L/(AE) over sin θ
    expect(result.displacements?.C.ux).toBe(0); // closed form: symmetry
  });
});

describe("a single bar pulled along its axis", () => {
  it("stretches by P L / (A E)", () => {
    const model: TrussModel = {
      joints: [{ id: "A", x: 0, y: 0 }, { id: "B", x: 5, y: 0 }],
      members: [{ id: "AB", start: "A", end: "B", A: 0.001, E: 2e8 }],
      supports: [{ joint: "A", type: "pin" }, { joint: "B", type: "roller" }],
      loadCases: [{ id: "T", loads: [{ joint: "B", fx: 50 }] }],
    };
    const result = solveTruss(model).cases.T;
    expect(result.displacements?.B.ux).toBeCloseTo(1.25e-3, 15); // closed form: δ = PL/(AE) = 50·5/(0.001·2e8)
    expect(result.forces.AB).toBeCloseTo(50, 10); // closed form: N = P
    expect(result.reactions.A.rx).toBeCloseTo(-50, 10); // closed form: ΣFx = 0
  });
});

describe("a triangle on a pin and a roller on a 30° incline", () => {
  // A(0,0) pin; B(8,0) rolls on a surface rising at α = 30°, so its reaction is normal to it: (−sin α, cos α). Apex C(4,3), P down.
  const P = 60, alpha = Math.PI / 6;
  const model: TrussModel = {
    joints: [{ id: "A", x: 0, y: 0 }, { id: "B", x: 8, y: 0 }, { id: "C", x: 4, y: 3 }],
    members: [{ id: "AB", start: "A", end: "B" }, { id: "BC", start: "B", end: "C" }, { id: "CA", start: "C", end: "A" }],
    supports: [{ joint: "A", type: "pin" }, { joint: "B", type: "roller", direction: [-Math.sin(alpha), Math.cos(alpha)] }],
    loadCases: [{ id: "P", loads: [{ joint: "C", fy: -P }] }],
  };
  const result = solveTruss(model).cases.P;

  it("gives the roller the reaction P / (2 cos α) normal to the incline", () => {
    expect(result.reactions.B.ry).toBeCloseTo(P / 2, 9); // closed form: ΣM about A = 0
    expect(result.reactions.B.rx).toBeCloseTo((-P * Math.tan(alpha)) / 2, 9); // closed form: R_B = P/(2 cos α) along (−sin α, cos α)
  });

  it("balances the roller's horizontal thrust at the pin", () => {
    expect(result.reactions.A.rx).toBeCloseTo((P * Math.tan(alpha)) / 2, 9); // closed form: ΣFx = 0
    expect(result.reactions.A.ry).toBeCloseTo(P / 2, 9); // closed form: ΣFy = 0
  });

  it("lets the tie carry the pin's horizontal reaction less the sloping bars' share", () => {
    // At B: the tie AB and BC (direction (−4, 3)/5) balance R_B. ΣFy: 0.6·N_BC + P/2 = 0; ΣFx: −N_AB − 0.8·N_BC + R_Bx = 0.
    const nBC = -P / 2 / 0.6; // closed form: method of joints at B, ΣFy
    expect(result.forces.BC).toBeCloseTo(nBC, 9); // closed form: method of joints at B, ΣFy
    expect(result.forces.AB).toBeCloseTo(-0.8 * nBC - (P * Math.tan(alpha)) / 2, 9); // closed form: method of joints at B, ΣFx
  });
});

describe("symmetric three-bar hanger (statically indeterminate)", () => {
  // Three bars from supports at y = L down to joint D(0, 0): one vertical, two at β = 45° from it; same A and E.
  const L = 2, P = 30, beta = Math.PI / 4;
  const off = L * Math.tan(beta);
  const model: TrussModel = {
    joints: [{ id: "D", x: 0, y: 0 }, { id: "S1", x: -off, y: L }, { id: "S2", x: 0, y: L }, { id: "S3", x: off, y: L }],
    members: ["S1", "S2", "S3"].map((s) => ({ id: `${s}D`, start: s, end: "D", A: 0.001, E: 2e8 })),
    supports: ["S1", "S2", "S3"].map((joint) => ({ joint, type: "pin" as const })),
    loadCases: [{ id: "P", loads: [{ joint: "D", fy: -P }] }],
  };
  const solution = solveTruss(model);
  const c3 = Math.cos(beta) ** 3;

  it("is indeterminate: m + r = 3 + 6 > 2j = 8", () => {
    expect(solution.classification).toBe("indeterminate"); // closed form: counting
  });

  it("shares the load as P/(1 + 2cos³β) in the vertical and P cos²β/(1 + 2cos³β) in each inclined bar", () => {
    expect(solution.cases.P.forces.S2D).toBeCloseTo(P / (1 + 2 * c3), 9); // closed form: compatibility δ_side = δ cos β with equal A E
    expect(solution.cases.P.forces.S1D).toBeCloseTo((P * Math.cos(beta) ** 2) / (1 + 2 * c3), 9); // closed form: same
    expect(solution.cases.P.displacements?.D.uy).toBeCloseTo(-(P * L) / (0.001 * 2e8 * (1 + 2 * c3)), 14); // closed form: δ = N_vertical L/(AE)
  });
});

describe("Pratt truss deflection", () => {
  it("equals Σ N·n·L/(A·E) for a unit load at the deflected joint", () => {
    const n = 8, p = 3, h = 2.5, A = 0.004, E = 2e8;
    const model = pratt(n, p, h, 15, { A, E });
    model.loadCases.push({ id: "unit", loads: [{ joint: "L4", fy: -1 }] });
    const { cases } = solveTruss(model);
    const at = new Map(model.joints.map((j) => [j.id, j]));
    let work = 0;
    for (const m of model.members) {
      const a = at.get(m.start);
      const b = at.get(m.end);
      if (!a || !b) throw new Error("bad fixture");
      work += (cases.P.forces[m.id] * cases.unit.forces[m.id] * Math.hypot(b.x - a.x, b.y - a.y)) / (A * E);
    }
    expect(-(cases.P.displacements?.L4.uy ?? 0)).toBeCloseTo(work, 12); // closed form: unit-load (virtual work) theorem
    expect(work).toBeGreaterThan(0); // closed form: the work of a load on its own deflection is positive
  });
});
