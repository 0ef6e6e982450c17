import { Matrix, SingularValueDecomposition } from "ml-matrix";
import { describe, expect, it } from "vitest";
import { isSolveError } from "@/lib/solve/errors";
import { countTruss, solveTruss } from "@/lib/solve/truss";
import { benchPratt } from "@/lib/solve/truss/bench-pratt";
import type { TrussModel } from "@/lib/solve/types";
import { catchSolveError, seededRandom, seedSquare, seedTriangle } from "./truss-fixtures";

function unstable(model: TrussModel) {
  const error = catchSolveError(() => countTruss(model));
  expect(error.code).toBe("UNSTABLE");
  return error;
}

describe("countTruss", () => {
  it("counts a determinate Pratt truss: m = 4n + 1, r = 3, j = 2n + 2", () => {
    const n = 8;
    expect(countTruss(benchPratt({ panels: n }))).toEqual({ m: 4 * n + 1, r: 3, j: 2 * n + 2, classification: "determinate" });
  });

  it("calls a stable truss with a redundant diagonal indeterminate", () => {
    const model = benchPratt({ panels: 4 });
    model.members.push({ id: "L0U1", start: "L0", end: "U1", A: 0.005, E: 2e8 });
    expect(countTruss(model)).toEqual({ m: 18, r: 3, j: 10, classification: "indeterminate" });
  });

  it("counts 2 reactions per pin and 1 per roller", () => {
    const model = seedTriangle();
    model.supports = [{ joint: "A", type: "pin" }, { joint: "B", type: "pin" }, { joint: "C", type: "roller", direction: [1, 0] }];
    expect(countTruss(model)).toMatchObject({ r: 5, classification: "indeterminate" });
  });

  it("reports the joints that can move when a square panel has no diagonal, although m + r = 2j", () => {
    const square = seedSquare();
    square.supports = [{ joint: "A", type: "pin" }, { joint: "B", type: "pin" }];
    const error = unstable(square);
    expect(error.joints).toEqual(["C", "D"]);
    expect(error.message).toMatch(/m \+ r = 4 \+ 4 = 8 against 2j = 8/);
    expect(error.message).toMatch(/members form a mechanism/);
  });

  it("accepts the same square once it has a diagonal", () => {
    const square = seedSquare();
    square.members.push({ id: "AC", start: "A", end: "C" });
    square.supports = [{ joint: "A", type: "pin" }, { joint: "B", type: "roller" }];
    expect(countTruss(square).classification).toBe("determinate");
  });

  it("reports a truss free to turn when the roller's line passes through the pin", () => {
    const model = seedTriangle();
    model.supports[1].direction = [1, 0];
    const error = unstable(model);
    expect(error.joints).toEqual(["B", "C"]);
    expect(error.message).toMatch(/turn about the point \(0, 0\)/);
  });

  it("reports a truss free to slide when every reaction is parallel", () => {
    const model = seedTriangle();
    model.supports = ["A", "B", "C"].map((joint) => ({ joint, type: "roller" as const }));
    const error = unstable(model);
    expect(error.joints).toEqual(["A", "B", "C"]);
    expect(error.message).toMatch(/slide: their reactions are all parallel/);
  });

  it("reports too few members and reactions when m + r < 2j", () => {
    const model = seedTriangle();
    model.supports = [{ joint: "A", type: "pin" }];
    const error = unstable(model);
    expect(error.message).toMatch(/m \+ r = 3 \+ 2 = 5 is less than 2j = 6/);
    expect(error.joints).toEqual(["B", "C"]);
  });

  it("reports a joint that no member reaches", () => {
    const model = seedTriangle();
    model.joints.push({ id: "lonely", x: 9, y: 9 });
    expect(unstable(model).joints).toEqual(["lonely"]);
  });

  it("finds a missing diagonal in a 4,000-joint truss and names the joints that move", () => {
    const model = benchPratt({ panels: 1999 });
    model.members = model.members.filter((m) => m.id !== "U700L701");
    const error = unstable(model);
    expect(error.joints).toContain("U700");
    expect(error.joints).toContain("L701");
    expect(error.joints).not.toContain("L0");
  });

  it("stops the solver too, before any force is computed", () => {
    const square = seedSquare();
    square.supports = [{ joint: "A", type: "pin" }, { joint: "B", type: "pin" }];
    expect(catchSolveError(() => solveTruss(square)).code).toBe("UNSTABLE");
  });

  it("agrees with a dense singular-value test on random small trusses, including the joints that move", () => {
    const random = seededRandom(7);
    let unstableSeen = 0;
    let stableSeen = 0;
    for (let trial = 0; trial < 300; trial++) {
      const model = randomGridTruss(random);
      const dense = denseMechanismJoints(model);
      let ours: string[] | "stable";
      try {
        countTruss(model);
        ours = "stable";
      } catch (error) {
        if (!isSolveError(error)) throw error;
        if (error.code === "INVALID") continue;
        ours = error.joints ?? [];
      }
      expect(ours).toEqual(dense);
      if (ours === "stable") stableSeen++;
      else unstableSeen++;
    }
    expect(stableSeen).toBeGreaterThan(20);
    expect(unstableSeen).toBeGreaterThan(20);
  });
});

/**
 * 3–7 joints on a 5 × 4 integer grid, built as a triangle plus joints each
 * tied by two members to earlier ones (stable unless a pair is collinear),
 * then randomly a member dropped or added, and random supports. Grid
 * coordinates make exact collinearity, and so true mechanisms, common.
 */
function randomGridTruss(random: () => number): TrussModel {
  const pick = (n: number) => Math.floor(random() * n);
  const jCount = 3 + pick(5);
  const joints = Array.from({ length: jCount }, (_, i) => ({ id: `J${i}`, x: pick(5), y: pick(4) }));
  const members: TrussModel["members"] = [];
  const add = (a: number, b: number) => members.push({ id: `M${members.length}`, start: `J${a}`, end: `J${b}` });
  add(0, 1);
  add(1, 2);
  add(2, 0);
  for (let i = 3; i < jCount; i++) {
    const a = pick(i);
    const b = (a + 1 + pick(i - 1)) % i;
    add(i, a);
    add(i, b);
  }
  if (random() < 0.3) members.splice(pick(members.length), 1);
  if (random() < 0.3) add(pick(jCount), pick(jCount));
  const supports: TrussModel["supports"] = [{ joint: "J0", type: "pin" }];
  for (let i = 1; i < jCount; i++) {
    const roll = random();
    if (roll < 0.15) supports.push({ joint: `J${i}`, type: "pin" });
    else if (roll < 0.45) supports.push({ joint: `J${i}`, type: "roller", direction: random() < 0.5 ? [0, 1] : [1, 0] });
  }
  if (random() < 0.2) supports.shift();
  return { joints, members, supports, loadCases: [] };
}

/** "stable", or the joints moving in the null space of the dense stiffness (unit axial stiffness), by singular value decomposition. */
function denseMechanismJoints(model: TrussModel): string[] | "stable" {
  const index = new Map(model.joints.map((j, i) => [j.id, i]));
  const restrained = new Set<number>();
  for (const s of model.supports) {
    const k = index.get(s.joint) ?? 0;
    if (s.type === "pin") restrained.add(2 * k).add(2 * k + 1);
    else restrained.add(s.direction?.[0] === 1 ? 2 * k : 2 * k + 1);
  }
  const free = [...Array(2 * model.joints.length).keys()].filter((d) => !restrained.has(d));
  const row = new Map(free.map((d, i) => [d, i]));
  const K = Matrix.zeros(free.length, free.length);
  for (const m of model.members) {
    const a = index.get(m.start) ?? 0;
    const b = index.get(m.end) ?? 0;
    const A = model.joints[a];
    const B = model.joints[b];
    const L = Math.hypot(B.x - A.x, B.y - A.y);
    const c = [-(B.x - A.x) / L, -(B.y - A.y) / L, (B.x - A.x) / L, (B.y - A.y) / L];
    const dofs = [2 * a, 2 * a + 1, 2 * b, 2 * b + 1];
    dofs.forEach((p, i) => dofs.forEach((q, k) => {
      const rp = row.get(p);
      const rq = row.get(q);
      if (rp !== undefined && rq !== undefined) K.set(rp, rq, K.get(rp, rq) + c[i] * c[k]);
    }));
  }
  if (free.length === 0) return "stable";
  // K is symmetric positive semi-definite, so its singular values are its eigenvalues and V holds its eigenvectors.
  const svd = new SingularValueDecomposition(K);
  const values = svd.diagonal;
  const top = Math.max(1, ...values);
  const moving = new Set<number>();
  values.forEach((lambda, i) => {
    if (lambda > 1e-9 * top) return;
    const v = svd.rightSingularVectors.getColumn(i);
    const peak = Math.max(...v.map(Math.abs));
    free.forEach((d, r) => Math.abs(v[r]) > 1e-6 * peak && moving.add(d >> 1));
  });
  if (moving.size === 0) return "stable";
  return [...moving].sort((p, q) => p - q).map((k) => model.joints[k].id);
}
