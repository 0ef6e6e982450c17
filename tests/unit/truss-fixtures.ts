import { SolveError } from "@/lib/solve/errors";
import type { TrussModel } from "@/lib/solve/types";

/**
 * Seed models for the truss tests. Each call returns a fresh object, so a
 * test may change it freely.
 */

/** A(0,0) pin, B(4,0) vertical roller, apex C(2,3); 10 kN down at C in case D. */
export function seedTriangle(): TrussModel {
  return {
    joints: [
      { id: "A", x: 0, y: 0 },
      { id: "B", x: 4, y: 0 },
      { id: "C", x: 2, y: 3 },
    ],
    members: [
      { id: "AB", start: "A", end: "B" },
      { id: "BC", start: "B", end: "C" },
      { id: "CA", start: "C", end: "A" },
    ],
    supports: [
      { joint: "A", type: "pin" },
      { joint: "B", type: "roller" },
    ],
    loadCases: [{ id: "D", loads: [{ joint: "C", fy: -10 }] }],
  };
}

/** A unit square A(0,0) B(1,0) C(1,1) D(0,1) with its four sides, no diagonal and no supports. */
export function seedSquare(): TrussModel {
  return {
    joints: [
      { id: "A", x: 0, y: 0 },
      { id: "B", x: 1, y: 0 },
      { id: "C", x: 1, y: 1 },
      { id: "D", x: 0, y: 1 },
    ],
    members: [
      { id: "AB", start: "A", end: "B" },
      { id: "BC", start: "B", end: "C" },
      { id: "CD", start: "C", end: "D" },
      { id: "DA", start: "D", end: "A" },
    ],
    supports: [],
    loadCases: [],
  };
}

/** A small deterministic pseudo-random generator (mulberry32), so that failures reproduce. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Options for {@link seedStrip}. */
export type StripOptions = {
  /** Number of triangles along the strip (at least 1). */
  triangles: number;
  /** Adds this many extra members between joints two apart along a chord, making the truss indeterminate. */
  redundants?: number;
  /** Gives the roller an inclined direction instead of vertical. */
  inclinedRoller?: boolean;
  /** Adds a second pin at the far end (indeterminate supports). */
  secondPin?: boolean;
  /** Leaves A and E off every member. */
  withoutSection?: boolean;
  /** Number of load cases with random joint loads. */
  loadCases?: number;
};

/**
 * A strip of triangles along x with jittered coordinates, random A and E and
 * random loads: bottom joints B0…, top joints T0… offset by half a panel.
 * Stable with a pin at B0 and a roller at the last bottom joint.
 */
export function seedStrip(random: () => number, options: StripOptions): TrussModel {
  const t = Math.max(1, options.triangles);
  const bottoms = Math.floor(t / 2) + 1 + (t % 2);
  const tops = t + 2 - bottoms;
  const jitter = () => (random() - 0.5) * 0.6;
  const joints = [];
  for (let i = 0; i < bottoms; i++) joints.push({ id: `B${i}`, x: 2 * i + jitter(), y: jitter() * 0.5 });
  for (let i = 0; i < tops; i++) joints.push({ id: `T${i}`, x: 2 * i + 1 + jitter(), y: 2 + jitter() });
  const order: string[] = [];
  for (let k = 0; k < t + 2; k++) order.push(k % 2 === 0 ? `B${k / 2}` : `T${(k - 1) / 2}`);
  const section = () => (options.withoutSection ? {} : { A: 0.001 + random() * 0.01, E: 1e8 + random() * 2e8 });
  const members = [];
  for (let k = 0; k + 1 < order.length; k++) members.push({ id: `W${k}`, start: order[k], end: order[k + 1], ...section() });
  for (let k = 0; k + 2 < order.length; k++) members.push({ id: `C${k}`, start: order[k], end: order[k + 2], ...section() });
  for (let k = 0; k < (options.redundants ?? 0) && k + 3 < order.length; k++) {
    members.push({ id: `R${k}`, start: order[k], end: order[k + 3], ...section() });
  }
  const last = `B${bottoms - 1}`;
  const angle = (random() - 0.5) * 1.2;
  const supports: TrussModel["supports"] = [
    { joint: "B0", type: "pin" },
    options.secondPin
      ? { joint: last, type: "pin" }
      : { joint: last, type: "roller", direction: options.inclinedRoller ? [Math.sin(angle), Math.cos(angle)] : [0, 1] },
  ];
  const loadCases = [];
  for (let c = 0; c < (options.loadCases ?? 1); c++) {
    const loads = joints.filter(() => random() < 0.6).map((j) => ({ joint: j.id, fx: (random() - 0.5) * 20, fy: -random() * 50 }));
    loadCases.push({ id: `LC${c + 1}`, loads: loads.length ? loads : [{ joint: "T0", fy: -10 }] });
  }
  return { joints, members, supports, loadCases };
}

/** Runs `f`, expecting a SolveError, and returns it. */
export function catchSolveError(f: () => unknown): SolveError {
  try {
    f();
  } catch (error) {
    if (error instanceof SolveError) return error;
    throw error;
  }
  throw new Error("expected a SolveError, but nothing was thrown");
}
