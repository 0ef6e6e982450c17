// npm run bench:solve — times the truss stiffness solution on long Pratt trusses, against a dense solve.
import { benchGraphRecompute } from "./bench-graph";
import { Matrix, solve } from "ml-matrix";
import { analyseStability } from "../lib/solve/truss/analyse-stability";
import { benchPratt } from "../lib/solve/truss/bench-pratt";
import { solveTruss } from "../lib/solve/truss/solve-truss";
import { validateTruss } from "../lib/solve/truss/validate-truss";
import type { TrussModel } from "../lib/solve/types";

const panelsFor = (joints: number) => Math.round(joints / 2) - 1;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[s.length >> 1];
}

let peakRss = 0;
let peakHeap = 0;
function sampleMemory(): void {
  const m = process.memoryUsage();
  peakRss = Math.max(peakRss, m.rss);
  peakHeap = Math.max(peakHeap, m.heapUsed);
}

function time(run: () => void, repeats: number, warmUps = 3): number {
  for (let k = 0; k < warmUps; k++) run();
  const times: number[] = [];
  for (let k = 0; k < repeats; k++) {
    const t0 = performance.now();
    run();
    times.push(performance.now() - t0);
    sampleMemory();
  }
  return median(times);
}

/** The same free-component stiffness equations, assembled dense and solved by LU (ml-matrix). */
function denseSolve(model: TrussModel): void {
  const clean = validateTruss(model);
  const { index, geometry, dofs } = analyseStability(clean);
  const n = dofs.n;
  const K = new Matrix(n, n);
  const f = new Matrix(n, 1);
  clean.members.forEach((mem, e) => {
    const k = ((mem.A ?? 1) * (mem.E ?? 1)) / geometry.length[e];
    const a = index.start[e];
    const b = index.end[e];
    const eq = [dofs.dof1[a], dofs.dof2[a], dofs.dof1[b], dofs.dof2[b]];
    const c = [geometry.cx[e], geometry.cy[e]];
    const v = [
      -(c[0] * dofs.e1x[a] + c[1] * dofs.e1y[a]), -(c[0] * dofs.e2x[a] + c[1] * dofs.e2y[a]),
      c[0] * dofs.e1x[b] + c[1] * dofs.e1y[b], c[0] * dofs.e2x[b] + c[1] * dofs.e2y[b],
    ];
    for (let p = 0; p < 4; p++) for (let q = 0; q < 4; q++) if (eq[p] >= 0 && eq[q] >= 0) K.set(eq[p], eq[q], K.get(eq[p], eq[q]) + k * v[p] * v[q]);
  });
  for (const load of clean.loadCases[0].loads) {
    const j = index.jointIndex.get(load.joint) ?? -1;
    if (dofs.dof2[j] >= 0) f.set(dofs.dof2[j], 0, f.get(dofs.dof2[j], 0) + (load.fy ?? 0));
  }
  solve(K, f);
}

const pad = (s: string | number, w: number) => String(s).padStart(w);
const ms = (t: number) => `${t.toFixed(2)} ms`;

console.log("Banded LDLᵀ (RCM order) on parallel-chord Pratt trusses, members with A and E, pin + roller\n");
console.log([pad("joints", 8), pad("members", 8), pad("band", 5), pad("1 case", 11), pad("10 cases", 11), pad("µs/joint", 9), pad("peak rss", 10), pad("peak heap", 10)].join(" "));
// Let the JIT settle on every code path first, so that the first row is not charged for compiling it.
const warmUp = benchPratt({ panels: panelsFor(1000), loadCases: 2 });
for (let k = 0; k < 40; k++) solveTruss(warmUp);
const perJoint: { joints: number; t: number }[] = [];
for (const target of [100, 1000, 10000]) {
  const one = benchPratt({ panels: panelsFor(target), loadCases: 1 });
  const ten = benchPratt({ panels: panelsFor(target), loadCases: 10 });
  const repeats = target >= 10000 ? 15 : 31;
  const t1 = time(() => solveTruss(one), repeats);
  const t10 = time(() => solveTruss(ten), repeats);
  const band = analyseStability(validateTruss(one)).dofs.bandwidth;
  perJoint.push({ joints: one.joints.length, t: t1 });
  console.log(
    [pad(one.joints.length, 8), pad(one.members.length, 8), pad(band, 5), pad(ms(t1), 11), pad(ms(t10), 11), pad(((t1 * 1000) / one.joints.length).toFixed(2), 9),
      pad(`${(peakRss / 2 ** 20).toFixed(0)} MB`, 10), pad(`${(peakHeap / 2 ** 20).toFixed(0)} MB`, 10)].join(" "),
  );
}

console.log("(peak memory is the largest seen so far in this process)");
console.log("\nAgainst a dense LU solve of the same equations (ml-matrix), one load case");
console.log([pad("joints", 8), pad("banded", 11), pad("dense", 12), pad("ratio", 8)].join(" "));
let ratioAt2000 = 0;
for (const target of [100, 1000, 2000]) {
  const model = benchPratt({ panels: panelsFor(target) });
  const banded = time(() => solveTruss(model), 15);
  // A dense solve at 2,000 joints takes about a minute, so large sizes run once without warm-up.
  const dense = target >= 1000 ? time(() => denseSolve(model), 1, 0) : time(() => denseSolve(model), 5);
  console.log([pad(model.joints.length, 8), pad(ms(banded), 11), pad(ms(dense), 12), pad(`${(dense / banded).toFixed(0)}×`, 8)].join(" "));
  if (target === 2000) ratioAt2000 = dense / banded;
}

const [, mid, large] = perJoint;
const growth = large.t / large.joints / (mid.t / mid.joints);
console.log(
  `\nGrowth: ${perJoint.map((p) => `${((p.t * 1000) / p.joints).toFixed(2)} µs/joint at ${p.joints}`).join(", ")}; ` +
    `time per joint at ${large.joints} is ${growth.toFixed(2)}× that at ${mid.joints} (1× is linear; below 100 joints fixed costs dominate).`,
);
console.log(`Target 10,000 joints under 50 ms: ${large.t < 50 ? "met" : "MISSED"} (${ms(large.t)}).`);
console.log(`Target at least 50× faster than dense at 2,000 joints: ${ratioAt2000 >= 50 ? "met" : "MISSED"} (${ratioAt2000.toFixed(0)}×).`);

// The live-editing figure: one input of a 50-calc package changes, only the affected calcs recompute.
const graph = await benchGraphRecompute();
console.log(
  `\nPackage recompute: ${graph.calcs} calcs, one input changed, ${graph.recomputed} recomputed, median ${graph.medianMs.toFixed(2)} ms ` +
    `(target under 10 ms: ${graph.medianMs < 10 ? "met" : "MISSED"}).`,
);
