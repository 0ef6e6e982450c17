import { benchPratt } from "./lib/solve/truss/bench-pratt";
import { solveTruss } from "./lib/solve/truss/solve-truss";
const m = benchPratt({ panels: 4999, loadCases: 1 });
for (let i = 0; i < 40; i++) solveTruss(m);
