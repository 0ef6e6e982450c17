import type { TrussModel } from "../types";

/** Options for {@link benchPratt}. */
export type BenchPrattOptions = {
  /** Number of panels n; the truss has 2(n + 1) joints and 4n + 1 members. */
  panels: number;
  /** Panel length (default 3). */
  panelLength?: number;
  /** Depth between chord centre lines (default 3). */
  depth?: number;
  /** Downward load at each interior bottom joint (default 10), per load case. */
  load?: number;
  /** Number of load cases, the k-th scaling the loads by k (default 1). */
  loadCases?: number;
};

/**
 * A parallel-chord Pratt truss for measuring the solver: bottom joints L0…Ln,
 * top joints U0…Un, end verticals, diagonals falling towards mid-span, a pin
 * at L0 and a roller at Ln, A and E on every member. Not a design generator.
 */
export function benchPratt(options: BenchPrattOptions): TrussModel {
  const { panels: n, panelLength: p = 3, depth: h = 3, load = 10, loadCases = 1 } = options;
  const joints = [];
  for (let i = 0; i <= n; i++) joints.push({ id: `L${i}`, x: i * p, y: 0 }, { id: `U${i}`, x: i * p, y: h });
  const section = { A: 0.005, E: 2e8 };
  const members = [];
  for (let i = 0; i < n; i++) {
    members.push({ id: `L${i}L${i + 1}`, start: `L${i}`, end: `L${i + 1}`, ...section });
    members.push({ id: `U${i}U${i + 1}`, start: `U${i}`, end: `U${i + 1}`, ...section });
    const down = i < n / 2 ? [`U${i}`, `L${i + 1}`] : [`L${i}`, `U${i + 1}`];
    members.push({ id: `${down[0]}${down[1]}`, start: down[0], end: down[1], ...section });
  }
  for (let i = 0; i <= n; i++) members.push({ id: `L${i}U${i}`, start: `L${i}`, end: `U${i}`, ...section });
  const cases = [];
  for (let k = 1; k <= loadCases; k++) {
    const loads = [];
    for (let i = 1; i < n; i++) loads.push({ joint: `L${i}`, fy: -load * k });
    cases.push({ id: `LC${k}`, loads });
  }
  return {
    units: { length: "m", force: "kN" },
    joints,
    members,
    supports: [
      { joint: "L0", type: "pin" },
      { joint: `L${n}`, type: "roller", direction: [0, 1] },
    ],
    loadCases: cases,
  };
}
