import { describe, expect, it } from "vitest";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import { demoCalcIds, demoFootbridgeDocument } from "@/lib/document/demo-footbridge-document";
import { changedCalcs } from "@/lib/exports/changed-calcs";

const side = (document: ReturnType<typeof demoFootbridgeDocument>) => ({ document, results: evaluateCalcs({ calcs: extractCalcs(document) }).results });

describe("the revision marks of an export", () => {
  it("marks the sheets of exactly the calcs a dead-load change moves, as the compare page lists them", () => {
    const before = demoFootbridgeDocument();
    const after = structuredClone(before);
    const truss = after.content!.find((n) => "attrs" in n && (n.attrs as { id?: string }).id === demoCalcIds.T1) as { attrs: { inputs: { lineLoads: { case: string; w: number }[] } } };
    truss.attrs.inputs.lineLoads.find((l) => l.case === "G")!.w = 3.4;
    // S1, J1 and D1 read only the pedestrian case Q, so their sheets are not marked.
    expect(changedCalcs(side(before), side(after)).sort()).toEqual([demoCalcIds.T1, demoCalcIds.C1, demoCalcIds.F1, demoCalcIds.M1].sort());
  });

  it("marks nothing on a first issue or when nothing changed", () => {
    const doc = demoFootbridgeDocument();
    expect(changedCalcs(null, side(doc))).toEqual([]);
    expect(changedCalcs(side(doc), side(demoFootbridgeDocument()))).toEqual([]);
  });
});
