import { describe, expect, it } from "vitest";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import { demoCalcIds, demoFootbridgeDocument } from "@/lib/document/demo-footbridge-document";
import type { BlockNode, PackageDocument } from "@/lib/document/document-types";
import { compareSnapshots } from "@/lib/review/compare/compare-snapshots";
import type { Snapshot } from "@/lib/review/compare/snapshot";

/** A snapshot as a draft is compared: the document with its calcs recomputed. */
function snapshot(document: PackageDocument, label: string): Snapshot {
  return { document, label, results: evaluateCalcs({ calcs: extractCalcs(document) }).results };
}

/** The demo footbridge package with T1's line load of one case set to `w` (kN/m). */
function withLineLoad(loadCase: "G" | "Q", w: number): PackageDocument {
  const doc = demoFootbridgeDocument();
  const t1 = doc.content!.find((n) => n.type === "truss") as { attrs: { inputs: { lineLoads: { case: string; w: number }[] } } };
  t1.attrs.inputs.lineLoads.find((l) => l.case === loadCase)!.w = w;
  return doc;
}

const rev0 = snapshot(demoFootbridgeDocument(), "Rev 0");

describe("comparing two snapshots of a package", () => {
  it("lists nothing when the two are the same", () => {
    expect(compareSnapshots(rev0, snapshot(demoFootbridgeDocument(), "Draft"))).toEqual({ from: "Rev 0", to: "Draft", calcs: [], text: [] });
  });

  it("after a change of the permanent load in T1, lists exactly T1 and the calcs whose values move with G, with old and new values", () => {
    const c = compareSnapshots(rev0, snapshot(withLineLoad("G", 3.5), "Draft"));
    // S1, J1 and D1 read T1 under Q alone: their values do not move, so they are not listed.
    expect(c.calcs.map((x) => [x.label, x.change])).toEqual([
      ["T1", "inputsChanged"],
      ["C1", "resultsChanged"],
      ["F1", "resultsChanged"],
      ["M1", "resultsChanged"],
    ]);
    expect(c.text).toEqual([]);
    // Closed form: the top chord at midspan carries w·L²/(8·h) = w·24²/(8·3) = 24·w in compression.
    const nG = c.calcs.find((x) => x.label === "F1")!.values.find((v) => v.name === "N_G")!;
    expect(nG.old!.value).toBeCloseTo(-24 * 3.0, 6);
    expect(nG.new!.value).toBeCloseTo(-24 * 3.5, 6);
    expect([nG.old!.unit, nG.new!.unit]).toEqual(["kN", "kN"]);
    // F1's area A is its own input: unchanged, so not among the values that moved.
    expect(c.calcs.find((x) => x.label === "F1")!.values.map((v) => v.name)).not.toContain("A");
    const t1 = c.calcs.find((x) => x.label === "T1")!;
    // T1's forces under G move; those under Q stay and are not listed.
    expect(t1.values.filter((v) => v.name.endsWith("_G")).length).toBeGreaterThan(0);
    expect(t1.values.filter((v) => v.name.endsWith("_Q"))).toEqual([]);
  });

  it("after a change of the pedestrian load, lists every calc that reads Q, the ones with unchanged inputs as resultsChanged", () => {
    const c = compareSnapshots(rev0, snapshot(withLineLoad("Q", 7), "Draft"));
    expect(c.calcs.map((x) => [x.label, x.change, x.inputsChanged])).toEqual([
      ["T1", "inputsChanged", true],
      ["C1", "resultsChanged", false],
      ["S1", "resultsChanged", false],
      ["J1", "resultsChanged", false],
      ["F1", "resultsChanged", false],
      ["M1", "resultsChanged", false],
      ["D1", "resultsChanged", false],
    ]);
    const delta = c.calcs.find((x) => x.label === "D1")!.values.find((v) => v.name === "delta")!;
    // Linear elastic: the deflection scales with the load.
    expect(delta.new!.value / delta.old!.value).toBeCloseTo(7 / 6.25, 9);
  });

  it("for a pure text edit, lists only the text, with its before and after", () => {
    const doc = demoFootbridgeDocument();
    const i = doc.content!.findIndex((n) => n.type === "paragraph" && JSON.stringify(n).includes("Alder Creek Footbridge (job"));
    doc.content![i] = { type: "paragraph", content: [{ type: "text", text: "The bridge spans 24 m over Alder Creek." }] };
    const c = compareSnapshots(rev0, snapshot(doc, "Draft"));
    expect(c.calcs).toEqual([]);
    expect(c.text).toHaveLength(1);
    expect(c.text[0]).toMatchObject({ change: "changed", kind: "paragraph", after: "The bridge spans 24 m over Alder Creek.", oldIndex: i, newIndex: i });
    expect(c.text[0].before).toMatch(/^Alder Creek Footbridge \(job KV-2026-014\) carries pedestrians/);
  });

  it("matches blocks by content, so an inserted heading and a removed paragraph are reported alone, not every block after them", () => {
    const doc = demoFootbridgeDocument();
    const blocks = doc.content as BlockNode[];
    const loadsAt = blocks.findIndex((n) => n.type === "heading" && JSON.stringify(n).includes('"Loads"'));
    const removed = blocks[loadsAt + 1];
    blocks.splice(loadsAt + 1, 1);
    blocks.splice(1, 0, { type: "heading", attrs: { level: 1 }, content: [{ type: "text", text: "Scope" }] });
    const c = compareSnapshots(rev0, snapshot(doc, "Draft"));
    expect(c.calcs).toEqual([]);
    expect(c.text.map((t) => [t.change, t.kind, t.after ?? t.before])).toEqual([
      ["added", "heading", "Scope"],
      ["removed", "paragraph", (removed as { content: { text: string }[] }).content[0].text],
    ]);
  });

  it("lists a deleted calc as removed and a new one as added, with their values", () => {
    const doc = demoFootbridgeDocument();
    doc.content = doc.content!.filter((n) => !(n.type === "deflection"));
    doc.content.push({ type: "formula", attrs: { id: "calc-new-f2", label: "F2", inputs: { source: "L = 24 m\nratio = L / 360 -> mm" } } });
    const c = compareSnapshots(rev0, snapshot(doc, "Draft"));
    expect(c.calcs.map((x) => [x.label, x.change, x.newIndex === null])).toEqual([
      ["F2", "added", false],
      ["D1", "removed", true],
    ]);
    expect(c.calcs[1].calcId).toBe(demoCalcIds.D1);
    expect(c.calcs[0].values.find((v) => v.name === "ratio")).toMatchObject({ old: null, new: { unit: "mm" } });
    expect(c.calcs[0].values.find((v) => v.name === "ratio")!.new!.value).toBeCloseTo(24000 / 360, 9);
  });
});
