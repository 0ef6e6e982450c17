import { Matrix, solve } from "ml-matrix";
import { describe, expect, it } from "vitest";
import { addToBand, bandEntry, createBandMatrix } from "@/lib/solve/sparse/band-matrix";
import { bandNullVector } from "@/lib/solve/sparse/band-null-vector";
import { buildAdjacency } from "@/lib/solve/sparse/build-adjacency";
import { factorBandLdlt } from "@/lib/solve/sparse/factor-band-ldlt";
import { reverseCuthillMcKee } from "@/lib/solve/sparse/reverse-cuthill-mckee";
import { solveBandLdlt } from "@/lib/solve/sparse/solve-band-ldlt";
import { seededRandom } from "./truss-fixtures";

/** Largest |position(a) − position(b)| over the edges, for an ordering of the nodes. */
function bandwidthOf(order: Int32Array, from: number[], to: number[]): number {
  const position = new Int32Array(order.length);
  order.forEach((node, k) => (position[node] = k));
  return Math.max(...from.map((a, e) => Math.abs(position[a] - position[to[e]])));
}

/** A random symmetric positive definite band matrix: diagonally dominant. */
function randomBand(random: () => number, n: number, b: number) {
  const K = createBandMatrix(n, b);
  const dense = Matrix.zeros(n, n);
  for (let i = 0; i < n; i++) {
    for (let j = Math.max(0, i - b); j < i; j++) {
      const v = random() - 0.5;
      addToBand(K, i, j, v);
      dense.set(i, j, v).set(j, i, v);
    }
  }
  for (let i = 0; i < n; i++) {
    const d = 2 * b + 1 + random();
    addToBand(K, i, i, d);
    dense.set(i, i, d);
  }
  return { K, dense };
}

describe("sparse band solver", () => {
  it("orders a shuffled ladder graph into a narrow band with reverse Cuthill–McKee", () => {
    const rungs = 500;
    const random = seededRandom(1);
    const label = Array.from({ length: 2 * rungs }, (_, i) => i).sort(() => random() - 0.5);
    const from: number[] = [];
    const to: number[] = [];
    const edge = (a: number, b: number) => { from.push(label[a]); to.push(label[b]); };
    for (let i = 0; i < rungs; i++) {
      edge(2 * i, 2 * i + 1);
      if (i + 1 < rungs) { edge(2 * i, 2 * i + 2); edge(2 * i + 1, 2 * i + 3); edge(2 * i, 2 * i + 3); }
    }
    const graph = buildAdjacency(2 * rungs, from, to);
    const order = reverseCuthillMcKee(graph);
    expect([...order].sort((a, b) => a - b)).toEqual(Array.from({ length: 2 * rungs }, (_, i) => i));
    expect(bandwidthOf(order, from, to)).toBeLessThanOrEqual(3);
    expect(bandwidthOf(Int32Array.from({ length: 2 * rungs }, (_, i) => i), from, to)).toBeGreaterThan(100);
  });

  it("orders every node of a graph in several pieces", () => {
    const graph = buildAdjacency(6, [0, 2, 4], [1, 3, 5]);
    expect([...reverseCuthillMcKee(graph)].sort()).toEqual([0, 1, 2, 3, 4, 5]);
  });

  it("solves a random positive definite band system as a dense LU solve does", () => {
    const random = seededRandom(3);
    for (const [n, b] of [[1, 0], [5, 1], [40, 3], [120, 7]]) {
      const { K, dense } = randomBand(random, n, b);
      const rhs = Array.from({ length: n }, () => random() - 0.5);
      const factor = factorBandLdlt(K, { pivotTolerance: 1e-12 });
      expect(factor.zeroPivots).toEqual([]);
      const ours = solveBandLdlt(factor, rhs);
      const theirs = solve(dense, Matrix.columnVector(rhs)).getColumn(0);
      theirs.forEach((v, i) => expect(ours[i]).toBeCloseTo(v, 12));
      expect(bandEntry(K, 0, 0)).toBe(dense.get(0, 0));
    }
  });

  it("finds each zero pivot of a singular matrix and a direction it cannot resist", () => {
    // Stiffness of a free chain of 4 unit springs: a rigid translation plus nothing else.
    const n = 4;
    const K = createBandMatrix(n, 1);
    for (let i = 0; i + 1 < n; i++) {
      addToBand(K, i, i, 1);
      addToBand(K, i + 1, i + 1, 1);
      addToBand(K, i + 1, i, -1);
    }
    const factor = factorBandLdlt(K, { pivotTolerance: 1e-10 });
    expect(factor.zeroPivots).toEqual([3]);
    const mode = bandNullVector(factor, 3);
    expect([...mode]).toEqual([1, 1, 1, 1]);
  });

  it("rejects an entry outside the band", () => {
    expect(() => addToBand(createBandMatrix(5, 1), 4, 0, 1)).toThrow(RangeError);
  });
});
