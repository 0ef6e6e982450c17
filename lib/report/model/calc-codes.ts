import type { CalcNode } from "../../calcs/calc-types";

type Ref = { code: string; edition: string; clause: string };

const combinationCodes: Record<string, Ref> = {
  "ASCE7-16-LRFD": { code: "ASCE/SEI 7", edition: "2016", clause: "2.3" },
  "ASCE7-22-LRFD": { code: "ASCE/SEI 7", edition: "2022", clause: "2.3" },
  "ASCE7-16-ASD": { code: "ASCE/SEI 7", edition: "2016", clause: "2.4" },
  "EN1990-6.10": { code: "EN 1990", edition: "2002", clause: "6.4.3.2, Eq. 6.10" },
  "EN1990-6.10ab": { code: "EN 1990", edition: "2002", clause: "6.4.3.2, Eq. 6.10a, Eq. 6.10b" },
};

const materialCodes: Record<string, Ref> = {
  "steel-aisc360": { code: "ANSI/AISC 360", edition: "2016", clause: "D2, D3, E3" },
  "steel-en1993": { code: "EN 1993-1-1", edition: "2005", clause: "6.2.3, 6.3.1" },
  "timber-nds": { code: "NDS", edition: "2018", clause: "3.6, 3.7, 3.8" },
};

/** The codes and editions a calc applies through its inputs (a combination set, a member design standard). */
export function calcCodes(calc: CalcNode): Ref[] {
  const inputs = (calc.inputs ?? {}) as { standard?: unknown; material?: unknown };
  if (calc.kind === "combinations") {
    const ref = combinationCodes[typeof inputs.standard === "string" ? inputs.standard : "EN1990-6.10"];
    return ref ? [ref] : [];
  }
  if (calc.kind === "memberDesign" && typeof inputs.material === "string") {
    const ref = materialCodes[inputs.material];
    return ref ? [ref] : [];
  }
  return [];
}
