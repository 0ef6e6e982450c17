import { Matrix, solve } from "ml-matrix";
import { describe, expect, it } from "vitest";
import { solveTruss } from "@/lib/solve/truss";
import { benchPratt } from "@/lib/solve/truss/bench-pratt";
import type { CaseResult, TrussModel } from "@/lib/solve/types";
import { seededRandom, seedStrip } from "./truss-fixtures";

/**
 * An independent dense solution of the same truss: all 2j global components,
 * supports as Lagrange constraints C·u = 0 (a pin restrains x and y, a roller
 * its direction), [K Cᵀ; C 0]·[u; λ] = [f; 0] solved by LU. Reactions are −Cᵀλ.
 */
function denseSolve(model: TrussModel, caseIndex: number): CaseResult {
  const j = model.joints.length;
  const at = new Map(model.joints.map((p, i) => [p.id, i]));
  const rows: { joint: number; cx: number; cy: number }[] = [];
  for (const s of model.supports) {
    const k = at.get(s.joint) ?? 0;
    if (s.type === "pin") rows.push({ joint: k, cx: 1, cy: 0 }, { joint: k, cx: 0, cy: 1 });
    else {
      const [dx, dy] = s.direction ?? [0, 1];
      const n = Math.hypot(dx, dy);
      rows.push({ joint: k, cx: dx / n, cy: dy / n });
    }
  }
  const size = 2 * j + rows.length;
  const A = Matrix.zeros(size, size);
  const b = Matrix.zeros(size, 1);
  const geometry = model.members.map((m) => {
    const p = model.joints[at.get(m.start) ?? 0];
    const q = model.joints[at.get(m.end) ?? 0];
    const L = Math.hypot(q.x - p.x, q.y - p.y);
    return { a: at.get(m.start) ?? 0, b: at.get(m.end) ?? 0, c: (q.x - p.x) / L, s: (q.y - p.y) / L, k: ((m.A ?? 1) * (m.E ?? 1)) / L };
  });
  for (const g of geometry) {
    const dofs = [2 * g.a, 2 * g.a + 1, 2 * g.b, 2 * g.b + 1];
    const v = [-g.c, -g.s, g.c, g.s];
    for (let p = 0; p < 4; p++) for (let q = 0; q < 4; q++) A.set(dofs[p], dofs[q], A.get(dofs[p], dofs[q]) + g.k * v[p] * v[q]);
  }
  rows.forEach((r, i) => {
    A.set(2 * j + i, 2 * r.joint, r.cx).set(2 * r.joint, 2 * j + i, r.cx);
    A.set(2 * j + i, 2 * r.joint + 1, r.cy).set(2 * r.joint + 1, 2 * j + i, r.cy);
  });
  for (const load of model.loadCases[caseIndex].loads) {
    const k = at.get(load.joint) ?? 0;
    b.set(2 * k, 0, b.get(2 * k, 0) + (load.fx ?? 0));
    b.set(2 * k + 1, 0, b.get(2 * k + 1, 0) + (load.fy ?? 0));
  }
  const x = solve(A, b).getColumn(0);
  const forces: Record<string, number> = {};
  model.members.forEach((m, e) => {
    const g = geometry[e];
    forces[m.id] = g.k * (g.c * (x[2 * g.b] - x[2 * g.a]) + g.s * (x[2 * g.b + 1] - x[2 * g.a + 1]));
  });
  const reactions: CaseResult["reactions"] = {};
  rows.forEach((r, i) => {
    const id = model.joints[r.joint].id;
    const R = reactions[id] ?? { rx: 0, ry: 0 };
    R.rx -= x[2 * j + i] * r.cx;
    R.ry -= x[2 * j + i] * r.cy;
    reactions[id] = R;
  });
  const displacements: CaseResult["displacements"] = {};
  model.joints.forEach((p, i) => (displacements[p.id] = { ux: x[2 * i], uy: x[2 * i + 1] }));
  return { forces, reactions, displacements };
}

/** Largest difference between two sets of values, relative to the largest value. */
function relativeGap(ours: number[], theirs: number[]): number {
  const scale = Math.max(...theirs.map(Math.abs));
  return Math.max(...ours.map((v, i) => Math.abs(v - theirs[i]))) / scale;
}

function compare(model: TrussModel): void {
  const solution = solveTruss(model);
  model.loadCases.forEach((c, i) => {
    const ours = solution.cases[c.id];
    const dense = denseSolve(model, i);
    const ids = model.members.map((m) => m.id);
    expect(relativeGap(ids.map((id) => ours.forces[id]), ids.map((id) => dense.forces[id]))).toBeLessThan(1e-8);
    const joints = model.joints.map((p) => p.id);
    const flat = (r: CaseResult) => joints.flatMap((id) => [r.displacements?.[id].ux ?? Number.NaN, r.displacements?.[id].uy ?? Number.NaN]);
    expect(relativeGap(flat(ours), flat(dense))).toBeLessThan(1e-8);
    const supports = model.supports.map((s) => s.joint);
    const react = (r: CaseResult) => supports.flatMap((id) => [r.reactions[id].rx, r.reactions[id].ry]);
    expect(relativeGap(react(ours), react(dense))).toBeLessThan(1e-8);
  });
}

describe("the banded solution agrees with a dense solve of the same stiffness equations", () => {
  it("on random determinate strips of triangles with jittered joints and random A, E and loads", () => {
    const random = seededRandom(2024);
    for (let trial = 0; trial < 25; trial++) compare(seedStrip(random, { triangles: 2 + Math.floor(random() * 30), loadCases: 2 }));
  });

  it("on random indeterminate strips: redundant members, a second pin", () => {
    const random = seededRandom(99);
    for (let trial = 0; trial < 25; trial++) {
      const model = seedStrip(random, { triangles: 4 + Math.floor(random() * 30), redundants: 1 + Math.floor(random() * 6), secondPin: trial % 2 === 0, loadCases: 2 });
      expect(solveTruss(model).classification).toBe("indeterminate");
      compare(model);
    }
  });

  it("on random strips held by an inclined roller", () => {
    const random = seededRandom(31);
    for (let trial = 0; trial < 15; trial++) compare(seedStrip(random, { triangles: 3 + Math.floor(random() * 20), inclinedRoller: true, redundants: trial % 3 }));
  });

  it("on a Pratt truss of 400 joints", () => {
    compare(benchPratt({ panels: 199, loadCases: 2 }));
  });
});
