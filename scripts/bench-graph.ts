// tsx scripts/bench-graph.ts — time to recompute a 50-calc package after one input changes
import { resolve } from "node:path";
import { pathToFileURL } from "node:url";
import { evaluateFormulas, listFormulaReferences, type Quantity } from "../lib/solve/formula";
import { type CalcOutcome, type GraphCalc, recomputePackage } from "../lib/solve/graph";

type BenchCalc = GraphCalc & { source: string };

const TRUSSES = 10;
const CHANGED_TRUSS = 6;

/** A truss stand-in: ten formula lines; from the second on it carries the previous truss's reaction. */
function trussSource(i: number, span: number): string {
  return [
    `# truss stand-in ${i}`,
    `L = ${span} m  # span`,
    "h = 1.8 m",
    "n = 6",
    "w_D = 4.5 kN/m",
    "w_L = 3 kN/m",
    i === 1 ? "P_in = 0 kN" : `P_in = T${i - 1}.R_B  # girder truss load`,
    "w_u = 1.2 w_D + 1.6 w_L",
    "R_A = w_u*L/2 + P_in/2",
    "R_B = w_u*L/2 + P_in/2",
    "M = w_u*L^2/8 + P_in*L/4 -> kN*m",
    "F_top = -M/h",
    "F_bot = M/h",
    "F_web = R_A*sqrt(h^2 + (L/n)^2)/h",
  ].join("\n");
}

/** Four member checks per truss, each about ten lines, reading the truss's exports. */
function checkSources(t: string): string[] {
  const tension = (force: string) =>
    [`F = ${t}.${force}`, "A_g = 2850 mm^2", "F_y = 345 MPa", "phi_t = 0.9", "P_n = F_y*A_g", "phiP_n = phi_t*P_n", "U = abs(F)/phiP_n", "sigma = F/A_g"];
  const compression = (force: string) => [
    `P = abs(${t}.${force})`, "E = 200 GPa", "F_y = 345 MPa", "A = 3600 mm^2", "r = 45 mm", `L_c = ${t}.L/${t}.n`,
    "lambda = L_c/r", "F_e = pi^2*E/lambda^2", "F_cr = 0.658^(F_y/F_e)*F_y", "phiP_n = 0.9*F_cr*A", "U = P/phiP_n",
  ];
  return [tension("F_bot"), compression("F_top"), compression("F_web"), tension("F_web")].map((lines) => lines.join("\n"));
}

function buildPackage(changedSpan: number): BenchCalc[] {
  const calcs: BenchCalc[] = [];
  for (let i = 1; i <= TRUSSES; i++) {
    const source = trussSource(i, i === CHANGED_TRUSS ? changedSpan : 12);
    calcs.push({ id: `t${i}`, label: `T${i}`, source, references: listFormulaReferences(source) });
    checkSources(`T${i}`).forEach((s, k) => {
      const n = (i - 1) * 4 + k + 1;
      calcs.push({ id: `d${n}`, label: `D${n}`, source: s, references: listFormulaReferences(s) });
    });
  }
  return calcs;
}

function evaluate(calc: BenchCalc, inputs: Record<string, Quantity>): Record<string, Quantity> {
  const result = evaluateFormulas({ source: calc.source, scope: inputs });
  if (result.errors.length > 0) throw new Error(result.errors.map((e) => e.message).join("; "));
  return result.exports;
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
}

/** Median time to recompute after one input of truss T6 changes (only the affected calcs), over 41 runs after 20 warm-up runs. */
export async function benchGraphRecompute(): Promise<{ calcs: number; recomputed: number; medianMs: number }> {
  let previous: { results: Record<string, CalcOutcome<Quantity>> } = recomputePackage({ calcs: buildPackage(12), evaluate });
  const failed = Object.values(previous.results).filter((r) => r.status !== "ok");
  if (failed.length > 0) throw new Error(`bench package does not evaluate: ${failed.map((f) => f.label).join(", ")}`);
  const times: number[] = [];
  let recomputed = 0;
  let calcs = 0;
  for (let run = 0; run < 61; run++) {
    const pkg = buildPackage(12 + 0.01 * (run + 1));
    const start = performance.now();
    const result = recomputePackage({ calcs: pkg, evaluate, previous, changed: [`t${CHANGED_TRUSS}`] });
    const elapsed = performance.now() - start;
    if (run >= 20) times.push(elapsed);
    previous = result;
    recomputed = result.recomputed.length;
    calcs = pkg.length;
  }
  return { calcs, recomputed, medianMs: median(times) };
}

/** Median time of a full recompute of the same package, for comparison. */
function benchFullRecompute(): number {
  const times: number[] = [];
  for (let run = 0; run < 26; run++) {
    const pkg = buildPackage(12 + 0.01 * (run + 1));
    const start = performance.now();
    recomputePackage({ calcs: pkg, evaluate });
    if (run >= 5) times.push(performance.now() - start);
  }
  return median(times);
}

if (process.argv[1] && import.meta.url === pathToFileURL(resolve(process.argv[1])).href) {
  const { calcs, recomputed, medianMs } = await benchGraphRecompute();
  const full = benchFullRecompute();
  console.log(`package: ${calcs} calcs (${TRUSSES} truss stand-ins + ${calcs - TRUSSES} member checks, ~10 formula lines each)`);
  console.log(`one input of T${CHANGED_TRUSS} changed: ${recomputed} calcs recomputed, median ${medianMs.toFixed(2)} ms (target < 10 ms)`);
  console.log(`full recompute of all ${calcs} calcs: median ${full.toFixed(2)} ms`);
}
