import { describe, expect, it } from "vitest";
import type { CalcNode } from "@/lib/calcs/calc-types";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import type { TrussInputs } from "@/lib/calcs/truss/truss-inputs";
import { allNumbers, demoCalc, demoCalcs, resultOf, seedCalc, valueOf } from "./calcs-fixtures";

/** The demo with one formula that reads nothing, so a change elsewhere must leave it alone. */
function demoWithUnrelated(): CalcNode[] {
  return [...demoCalcs(), seedCalc("formula", { source: "g = 9.81 m/s^2" }, "F2")];
}

/** A copy of the calcs with T1's pedestrian line load set to `w`, as the editor would hand it over. */
function withPedestrianLoad(calcs: CalcNode[], w: number): CalcNode[] {
  return calcs.map((c) => {
    if (c.label !== "T1") return c;
    const inputs = structuredClone(c.inputs) as TrussInputs;
    inputs.lineLoads = inputs.lineLoads?.map((l) => (l.case === "Q" ? { ...l, w } : l));
    return { ...c, inputs };
  });
}

describe("evaluateCalcs", () => {
  it("evaluates the demo package with every calc ok and nothing but finite numbers", () => {
    const evaluation = evaluateCalcs({ calcs: demoCalcs() });
    expect(Object.values(evaluation.results).map((r) => [r.label, r.status])).toEqual(
      ["T1", "C1", "S1", "J1", "F1", "M1", "D1"].map((label) => [label, "ok"]),
    );
    expect(allNumbers(Object.values(evaluation.results)).every(Number.isFinite)).toBe(true);
  });

  it("recomputes S1, F1, M1 and D1 after a change to T1, but not an unrelated formula", () => {
    const calcs = demoWithUnrelated();
    const first = evaluateCalcs({ calcs });
    const changed = withPedestrianLoad(calcs, 7.5);
    const t1 = demoCalc("T1", changed);
    const next = evaluateCalcs({ calcs: changed, previous: first, changed: [t1.id] });
    const labels = next.recomputed.map((id) => next.results[id].label);
    expect(labels).toEqual(expect.arrayContaining(["T1", "C1", "S1", "J1", "F1", "M1", "D1"]));
    expect(labels).not.toContain("F2");
    const f2 = demoCalc("F2", changed).id;
    expect(next.results[f2]).toBe(first.results[f2]);
    // The section cut follows the load: U2U3 = −M/d with M = 72 w at x = 12 m.
    expect(valueOf(resultOf(next, "S1"), "F_U2U3")).toBeCloseTo((-72 * 7.5) / 3, 6);
    expect(valueOf(resultOf(next, "M1"), "U_max")).toBeGreaterThan(valueOf(resultOf(first, "M1"), "U_max"));
  });

  it("gives the same results incrementally as from scratch", () => {
    const calcs = demoWithUnrelated();
    const changed = withPedestrianLoad(calcs, 4);
    const incremental = evaluateCalcs({ calcs: changed, previous: evaluateCalcs({ calcs }), changed: [demoCalc("T1", changed).id] });
    const full = evaluateCalcs({ calcs: changed });
    for (const label of ["S1", "F1", "M1", "D1", "F2"]) expect(resultOf(incremental, label).exports).toEqual(resultOf(full, label).exports);
  });

  it("recomputes only the changed formula when nothing reads it", () => {
    const calcs = demoWithUnrelated();
    const first = evaluateCalcs({ calcs });
    const f2 = demoCalc("F2", calcs);
    const edited = calcs.map((c) => (c.id === f2.id ? { ...c, inputs: { source: "g = 10 m/s^2" } } : c));
    const next = evaluateCalcs({ calcs: edited, previous: first, changed: [f2.id] });
    expect(next.recomputed).toEqual([f2.id]);
    expect(valueOf(resultOf(next, "F2"), "g")).toBe(10);
  });

  it("re-reads inputs edited in place when the calc is said to have changed", () => {
    const formula = seedCalc("formula", { source: "a = 1 m" }, "F1");
    const first = evaluateCalcs({ calcs: [formula] });
    (formula.inputs as { source: string }).source = "a = 5 m";
    const next = evaluateCalcs({ calcs: [formula], previous: first, changed: [formula.id] });
    expect(valueOf(resultOf(next, "F1"), "a")).toBe(5);
  });

  it("shows a cycle F1 ↔ F2 on both calcs", () => {
    const f1 = seedCalc("formula", { source: "a = F2.b + 1 m" }, "F1");
    const f2 = seedCalc("formula", { source: "b = F1.a * 2" }, "F2");
    const evaluation = evaluateCalcs({ calcs: [f1, f2] });
    expect(evaluation.results[f1.id].status).toBe("error");
    expect(evaluation.results[f1.id].messages).toEqual(["Circular reference: F1 → F2 → F1. A calc cannot depend on its own results."]);
    expect(evaluation.results[f2.id].messages[0]).toContain("F2 → F1 → F2");
  });

  it("shows a broken reference to T9 on the calc that has it, and the others still evaluate", () => {
    const cut = seedCalc("sectionCut", { truss: "T9", members: [] }, "S1");
    const formula = seedCalc("formula", { source: "x = T9.F_U1U2_G * 2" }, "F1");
    const fine = seedCalc("formula", { source: "y = 2 m" }, "F3");
    const evaluation = evaluateCalcs({ calcs: [cut, formula, fine] });
    expect(evaluation.results[cut.id].messages).toEqual(["Broken reference: T9 is not in this package."]);
    expect(evaluation.results[formula.id].messages).toEqual(["Broken reference T9.F_U1U2_G: T9 is not in this package."]);
    expect(evaluation.results[fine.id].status).toBe("ok");
  });

  it("reports a value the truss does not export as a broken reference", () => {
    const formula = seedCalc("formula", { source: "x = T1.F_NOPE_G" }, "F1");
    const r = evaluateCalcs({ calcs: [demoCalc("T1"), formula] }).results[formula.id];
    expect(r.messages).toEqual(["Broken reference T1.F_NOPE_G: T1 has no value F_NOPE_G."]);
  });

  it("marks the calcs that read a truss with invalid inputs as waiting on it", () => {
    const calcs = demoCalcs();
    (calcs[0].inputs as TrussInputs).members[0].end = "nowhere";
    const evaluation = evaluateCalcs({ calcs });
    expect(resultOf(evaluation, "T1").fieldErrors[0].path).toBe("members[0].end");
    expect(resultOf(evaluation, "S1").status).toBe("blocked");
    expect(resultOf(evaluation, "S1").messages).toEqual(["Waiting on T1, which has a problem to fix first."]);
    expect(resultOf(evaluation, "M1").messages).toEqual(["Waiting on T1 and C1, which have a problem to fix first."]);
  });

  it("refuses a label used twice on the second calc, and evaluates the first", () => {
    const a = seedCalc("formula", { source: "a = 1 m" }, "F1");
    const b = seedCalc("formula", { source: "b = 2 m" }, "F1");
    const evaluation = evaluateCalcs({ calcs: [a, b] });
    expect(evaluation.results[a.id].status).toBe("ok");
    expect(evaluation.results[b.id].status).toBe("error");
    expect(evaluation.results[b.id].messages[0]).toContain("already used");
  });

  it("breaks the references to a renamed calc", () => {
    const calcs = demoCalcs().map((c) => (c.label === "T1" ? { ...c, label: "T7" } : c));
    const evaluation = evaluateCalcs({ calcs });
    expect(resultOf(evaluation, "S1").messages).toEqual(["Broken reference: T1 is not in this package."]);
    expect(resultOf(evaluation, "T7").status).toBe("ok");
  });

  it("keeps results in document order", () => {
    const calcs = demoCalcs();
    expect(Object.keys(evaluateCalcs({ calcs }).results)).toEqual(calcs.map((c) => c.id));
  });

  // The time this takes is measured by `npm run bench:editor`, not here: this test pins the property that makes it fast.
  it("recomputes only the changed calc out of 50, keeping every other result from the previous pass", () => {
    const calcs: CalcNode[] = [
      ...demoCalcs(),
      ...Array.from({ length: 43 }, (_, i) => seedCalc("formula", { source: `a = ${i} kN\nb = a * 2\nc = T1.F_U2U3_G + b` }, `F${i + 10}`)),
    ];
    let previous = evaluateCalcs({ calcs: structuredClone(calcs) });
    for (let k = 0; k < 3; k++) {
      // A fresh copy each time, as the editor hands over a new document on every keystroke.
      const next = structuredClone(calcs);
      next[20].inputs = { source: `a = ${k} kN\nb = a * 2\nc = T1.F_U2U3_G + b` };
      const before = previous;
      previous = evaluateCalcs({ calcs: next, previous, changed: [next[20].id] });
      expect(previous.recomputed).toEqual([calcs[20].id]);
      for (const c of calcs) if (c.id !== calcs[20].id) expect(previous.results[c.id]).toBe(before.results[c.id]);
    }
  });
});
