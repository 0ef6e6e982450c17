import type { CalcNode, CalcResult } from "../../calcs/calc-types";
import type { DesignCriteria } from "../report-model";
import { fixed } from "./format-quantity";

const kindNames: Record<string, string> = {
  D: "dead", L: "live", Lr: "roof live", S: "snow", R: "rain", W: "wind", G: "permanent", Q: "variable (imposed)",
};

type TrussLike = { loadCases?: { id: string; kind: string; loads?: unknown[] }[]; lineLoads?: { case: string; w: number }[]; units?: { length?: string; force?: string } };

/**
 * Each truss's load cases with their kind and loads in words. A case is used
 * by its truss and by every calc that reads that truss in that case; calcs
 * that read every case (combinations, member design through them) use all.
 */
export function loadCaseCriteria(calcs: CalcNode[], results: Record<string, CalcResult>): DesignCriteria["loadCases"] {
  const out: DesignCriteria["loadCases"] = [];
  for (const truss of calcs) {
    if (truss.kind !== "truss") continue;
    const inputs = (truss.inputs ?? {}) as TrussLike;
    const readers = calcs.filter((c) => c.id !== truss.id && (c.inputs as { truss?: string } | null)?.truss === truss.label);
    for (const c of inputs.loadCases ?? []) {
      const usedBy = [truss.label];
      for (const r of readers) {
        const view = results[r.id]?.view as { loadCase?: string } | null;
        const single = r.kind === "sectionCut" || r.kind === "joint" || r.kind === "deflection";
        const fromCombinations = r.kind === "memberDesign" && calcs.some((x) => x.kind === "combinations" && x.label === (r.inputs as { source?: string }).source);
        const caseRead = view?.loadCase ?? ((r.inputs as { loadCase?: string; source?: string }).loadCase || (r.inputs as { source?: string }).source);
        if (r.kind === "combinations" || fromCombinations || (single || r.kind === "memberDesign" ? caseRead === c.id : false)) usedBy.push(r.label);
      }
      out.push({ id: c.id, kind: kindNames[c.kind] ? `${c.kind} — ${kindNames[c.kind]}` : c.kind, description: describe(inputs, c), usedBy });
    }
  }
  return out;
}

function describe(inputs: TrussLike, c: { id: string; loads?: unknown[] }): string {
  const force = inputs.units?.force ?? "kN";
  const length = inputs.units?.length ?? "m";
  const parts = (inputs.lineLoads ?? []).filter((l) => l.case === c.id).map((l) => `line load ${fixed(l.w, 2)} ${force}/${length}`);
  const n = c.loads?.length ?? 0;
  if (n > 0) parts.push(`${n} joint load${n === 1 ? "" : "s"}`);
  return parts.join(", ") || "no load entered";
}
