/**
 * Small trusses for the hand-method tests (sections, joints, deflection),
 * built here rather than with the product's generators so these tests stand
 * on their own geometry. Ids follow the usual L (lower) / U (upper) panel-point
 * labels; every member gets A and E so displacements are available.
 */
import type { JointLoad, Member, TrussModel } from "@/lib/solve/types";

export type ParallelChordOptions = { panels: number; a: number; h: number; loads: number[]; A?: number; E?: number };

const bar = (start: string, end: string, A: number, E: number): Member => ({ id: `${start}${end}`, start, end, A, E });

/** Interior bottom-joint loads (downwards) for a parallel-chord truss, one per joint L1 … L(n-1). */
function bottomLoads(loads: number[]): JointLoad[] {
  return loads.map((p, i) => ({ joint: `L${i + 1}`, fy: -p })).filter((l) => l.fy !== 0);
}

/** Pratt (n even): end posts, verticals, diagonals falling towards midspan (tension under gravity). */
export function pratt(o: ParallelChordOptions): TrussModel {
  return panelTruss(o, (i, n) => (i < n / 2 ? [`U${i}`, `L${i + 1}`] : i > n / 2 ? [`U${i}`, `L${i - 1}`] : null));
}

/** Howe (n even): diagonals rising towards midspan (compression under gravity). */
export function howe(o: ParallelChordOptions): TrussModel {
  return panelTruss(o, (i, n) => (i < n / 2 ? [`L${i}`, `U${i + 1}`] : i > n / 2 ? [`L${i}`, `U${i - 1}`] : null));
}

function panelTruss(o: ParallelChordOptions, diagonal: (i: number, n: number) => [string, string] | null): TrussModel {
  const { panels: n, a, h } = o;
  const A = o.A ?? 0.002;
  const E = o.E ?? 2e8;
  const joints = [
    ...Array.from({ length: n + 1 }, (_, i) => ({ id: `L${i}`, x: i * a, y: 0 })),
    ...Array.from({ length: n - 1 }, (_, k) => ({ id: `U${k + 1}`, x: (k + 1) * a, y: h })),
  ];
  const members: Member[] = [];
  for (let i = 0; i < n; i++) members.push(bar(`L${i}`, `L${i + 1}`, A, E));
  for (let i = 1; i < n - 1; i++) members.push(bar(`U${i}`, `U${i + 1}`, A, E));
  members.push(bar("L0", "U1", A, E), bar(`U${n - 1}`, `L${n}`, A, E));
  for (let i = 1; i < n; i++) members.push(bar(`U${i}`, `L${i}`, A, E));
  for (let i = 1; i < n; i++) {
    const d = diagonal(i, n);
    if (d) members.push(bar(d[0], d[1], A, E));
  }
  return {
    joints,
    members,
    supports: [{ joint: "L0", type: "pin" }, { joint: `L${n}`, type: "roller" }],
    loadCases: [{ id: "D", loads: bottomLoads(o.loads) }],
  };
}

/** Warren with n panels: top joints over mid-panels, no verticals. */
export function warren(o: ParallelChordOptions): TrussModel {
  const { panels: n, a, h } = o;
  const A = o.A ?? 0.002;
  const E = o.E ?? 2e8;
  const joints = [
    ...Array.from({ length: n + 1 }, (_, i) => ({ id: `L${i}`, x: i * a, y: 0 })),
    ...Array.from({ length: n }, (_, k) => ({ id: `U${k + 1}`, x: (k + 0.5) * a, y: h })),
  ];
  const members: Member[] = [];
  for (let i = 0; i < n; i++) members.push(bar(`L${i}`, `L${i + 1}`, A, E));
  for (let i = 1; i < n; i++) members.push(bar(`U${i}`, `U${i + 1}`, A, E));
  for (let i = 1; i <= n; i++) members.push(bar(`L${i - 1}`, `U${i}`, A, E), bar(`U${i}`, `L${i}`, A, E));
  return {
    joints,
    members,
    supports: [{ joint: "L0", type: "pin" }, { joint: `L${n}`, type: "roller" }],
    loadCases: [{ id: "D", loads: bottomLoads(o.loads) }],
  };
}

/** The 4-panel Pratt used throughout: a = 3 m, h = 4 m (diagonals 5 m), 10 kN at L1, L2, L3. */
export function pratt4(): TrussModel {
  return pratt({ panels: 4, a: 3, h: 4, loads: [10, 10, 10] });
}

/**
 * A pitched truss with 2 m end verticals rising to a 4 m apex over 8 m, two
 * panels: its top chord extended meets the bottom chord 4 m left of L0, off
 * the truss. 12 kN at the apex U1 and 6 kN at L1.
 */
export function trapezoid(): TrussModel {
  const A = 0.002;
  const E = 2e8;
  return {
    joints: [
      { id: "L0", x: 0, y: 0 }, { id: "L1", x: 4, y: 0 }, { id: "L2", x: 8, y: 0 },
      { id: "U0", x: 0, y: 2 }, { id: "U1", x: 4, y: 4 }, { id: "U2", x: 8, y: 2 },
    ],
    members: [
      bar("L0", "L1", A, E), bar("L1", "L2", A, E), bar("U0", "U1", A, E), bar("U1", "U2", A, E),
      bar("L0", "U0", A, E), bar("L2", "U2", A, E), bar("U1", "L1", A, E), bar("U0", "L1", A, E), bar("U2", "L1", A, E),
    ],
    supports: [{ joint: "L0", type: "pin" }, { joint: "L2", type: "roller" }],
    loadCases: [{ id: "D", loads: [{ joint: "U1", fy: -12 }, { joint: "L1", fy: -6 }] }],
  };
}

/** A 3-4-5 triangle: pin A (0,0), roller B (6,0), apex C (3,4) carrying `p` downwards. */
export function triangle(p = 10): TrussModel {
  const A = 0.001;
  const E = 2e8;
  return {
    joints: [{ id: "A", x: 0, y: 0 }, { id: "B", x: 6, y: 0 }, { id: "C", x: 3, y: 4 }],
    members: [bar("A", "B", A, E), bar("A", "C", A, E), bar("B", "C", A, E)],
    supports: [{ joint: "A", type: "pin" }, { joint: "B", type: "roller" }],
    loadCases: [{ id: "D", loads: [{ joint: "C", fy: -p }] }],
  };
}

/** The 4-panel Pratt with a second diagonal in panel 2 (U2L1): one degree indeterminate. */
export function prattWithCounter(): TrussModel {
  const model = pratt4();
  return { ...model, members: [...model.members, bar("U2", "L1", 0.002, 2e8)] };
}

/** Pitched Howe over 12 m with a 3 m rise (top chord through the heels), 10 kN at L1, L2, L3. */
export function pitchedHowe(): TrussModel {
  const A = 0.002;
  const E = 2e8;
  return {
    joints: [
      ...[0, 1, 2, 3, 4].map((i) => ({ id: `L${i}`, x: 3 * i, y: 0 })),
      { id: "U1", x: 3, y: 1.5 }, { id: "U2", x: 6, y: 3 }, { id: "U3", x: 9, y: 1.5 },
    ],
    members: [
      bar("L0", "L1", A, E), bar("L1", "L2", A, E), bar("L2", "L3", A, E), bar("L3", "L4", A, E),
      bar("L0", "U1", A, E), bar("U1", "U2", A, E), bar("U2", "U3", A, E), bar("U3", "L4", A, E),
      bar("U1", "L1", A, E), bar("U2", "L2", A, E), bar("U3", "L3", A, E), bar("L1", "U2", A, E), bar("L3", "U2", A, E),
    ],
    supports: [{ joint: "L0", type: "pin" }, { joint: "L4", type: "roller" }],
    loadCases: [{ id: "D", loads: [1, 2, 3].map((i) => ({ joint: `L${i}`, fy: -10 })) }],
  };
}

/** Two triangles joined by three links (AD, BE, CF): every joint has three members, so the method of joints cannot start. */
export function prism(): TrussModel {
  const A = 0.001;
  const E = 2e8;
  return {
    joints: [
      { id: "A", x: 0, y: 0 }, { id: "B", x: 6, y: 0 }, { id: "C", x: 3, y: 5 },
      { id: "D", x: 1.5, y: 1 }, { id: "E", x: 4, y: 0.8 }, { id: "F", x: 3.2, y: 3 },
    ],
    members: [
      bar("A", "B", A, E), bar("B", "C", A, E), bar("C", "A", A, E), bar("D", "E", A, E), bar("E", "F", A, E),
      bar("F", "D", A, E), bar("A", "D", A, E), bar("B", "E", A, E), bar("C", "F", A, E),
    ],
    supports: [{ joint: "A", type: "pin" }, { joint: "B", type: "roller" }],
    loadCases: [{ id: "D", loads: [{ joint: "F", fy: -10 }] }],
  };
}
