import { describe, expect, it } from "vitest";
import { evaluateFormulas, listFormulaReferences, type Quantity } from "@/lib/solve/formula";
import { type GraphCalc, recomputePackage } from "@/lib/solve/graph";

/** A stand-in calc: its exports are `base` plus the sum of its inputs, so each value shows what flowed in. */
type SumCalc = GraphCalc & { base: number };
const sumCalc = (label: string, references: string[] = [], base = 1): SumCalc => ({ id: label.toLowerCase(), label, references, base });

function recorder() {
  const calls: { label: string; inputs: Record<string, number> }[] = [];
  const evaluate = (calc: SumCalc, inputs: Record<string, number>) => {
    calls.push({ label: calc.label, inputs });
    return { v: calc.base + Object.values(inputs).reduce((a, b) => a + b, 0) };
  };
  return { calls, evaluate };
}

describe("recomputePackage", () => {
  it("evaluates every calc in dependency order, feeding each the values it references as Label.name", () => {
    const { calls, evaluate } = recorder();
    const r = recomputePackage({ calcs: [sumCalc("F2", ["T1.v"], 10), sumCalc("T1", [], 5)], evaluate });
    expect(calls).toEqual([
      { label: "T1", inputs: {} },
      { label: "F2", inputs: { "T1.v": 5 } },
    ]);
    expect(r.results.f2).toEqual({ id: "f2", label: "F2", status: "ok", exports: { v: 15 }, issues: [] });
    expect(r.recomputed).toEqual(["t1", "f2"]);
  });

  it("passes every exported value of a calc referenced as a whole", () => {
    const r = recomputePackage({
      calcs: [{ id: "t1", label: "T1", references: [] }, { id: "f1", label: "F1", references: ["T1"] }],
      evaluate: (calc, inputs: Record<string, number>): Record<string, number> =>
        calc.id === "t1" ? { a: 1, b: 2 } : { seen: Object.keys(inputs).length },
    });
    expect(r.results.f1.exports).toEqual({ seen: 2 });
  });

  it("with changed, evaluates only the changed calcs and those downstream, keeping the others", () => {
    const calcs = [sumCalc("T1"), sumCalc("T2", [], 100), sumCalc("D1", ["T1.v"]), sumCalc("D2", ["T2.v"])];
    const first = recomputePackage({ calcs, evaluate: recorder().evaluate });
    const { calls, evaluate } = recorder();
    const changedCalcs = calcs.map((c) => (c.id === "t1" ? { ...c, base: 7 } : c));
    const second = recomputePackage({ calcs: changedCalcs, evaluate, previous: first, changed: ["t1"] });
    expect(calls.map((c) => c.label)).toEqual(["T1", "D1"]);
    expect(second.recomputed).toEqual(["t1", "d1"]);
    expect(second.results.d1.exports).toEqual({ v: 8 });
    expect(second.results.d2).toEqual(first.results.d2);
  });

  it("evaluates everything when changed is given but there is no previous result", () => {
    const { calls, evaluate } = recorder();
    recomputePackage({ calcs: [sumCalc("T1"), sumCalc("T2")], evaluate, changed: ["t1"] });
    expect(calls.map((c) => c.label)).toEqual(["T1", "T2"]);
  });

  it("reports a broken reference on the calc that has it and blocks the calcs that read that calc", () => {
    const { calls, evaluate } = recorder();
    const r = recomputePackage({ calcs: [sumCalc("T1"), sumCalc("F2", ["T9.v", "T1.v"]), sumCalc("F3", ["F2.v"]), sumCalc("F4", ["T1.v"])], evaluate });
    expect(r.results.f2).toMatchObject({ status: "error", exports: {}, issues: [{ kind: "broken", reference: "T9.v", message: "T9 is not in this package" }] });
    expect(r.results.f3).toMatchObject({ status: "blocked", issues: [{ kind: "blocked", message: "depends on F2 which has an error" }] });
    expect(r.results.f4.status).toBe("ok");
    expect(calls.map((c) => c.label)).toEqual(["T1", "F4"]);
  });

  it("reports a cycle on each calc in it and evaluates none of them", () => {
    const { calls, evaluate } = recorder();
    const r = recomputePackage({ calcs: [sumCalc("F3", ["F4.v"]), sumCalc("F4", ["F3.v"]), sumCalc("F5", ["F4.v"])], evaluate });
    expect(r.results.f3.issues).toEqual([{ kind: "cycle", message: "F3 → F4 → F3", path: ["F3", "F4", "F3"] }]);
    expect(r.results.f4.issues[0].message).toBe("F4 → F3 → F4");
    expect(r.results.f5.status).toBe("blocked");
    expect(calls).toEqual([]);
  });

  it("reports a calc whose evaluation throws and goes on with the rest of the package", () => {
    const r = recomputePackage({
      calcs: [sumCalc("T1"), sumCalc("T2"), sumCalc("D1", ["T1.v"])],
      evaluate: (calc: SumCalc) => {
        if (calc.label === "T1") throw new Error("the truss is unstable");
        return { v: 1 };
      },
    });
    expect(r.results.t1).toMatchObject({ status: "error", issues: [{ kind: "failed", message: "the truss is unstable" }] });
    expect(r.results.t2.status).toBe("ok");
    expect(r.results.d1.status).toBe("blocked");
  });

  it("reports a referenced value the calc did not export", () => {
    const { evaluate } = recorder();
    const r = recomputePackage({ calcs: [sumCalc("T1"), sumCalc("D1", ["T1.nope"])], evaluate });
    expect(r.results.d1).toMatchObject({ status: "error", issues: [{ kind: "broken", message: "T1 has no value nope", reference: "T1.nope" }] });
  });

  it("re-evaluates a calc that had an error last time even when it is not among the changed", () => {
    const calcs = [sumCalc("T1"), sumCalc("D1", ["T9.v"])];
    const first = recomputePackage({ calcs, evaluate: recorder().evaluate });
    const { calls, evaluate } = recorder();
    const fixed = [calcs[0], sumCalc("D1", ["T1.v"])];
    const second = recomputePackage({ calcs: fixed, evaluate, previous: first, changed: [] });
    expect(calls.map((c) => c.label)).toEqual(["D1"]);
    expect(second.results.d1.status).toBe("ok");
  });

  it("recomputes a package of Formula calcs, carrying values with their units", () => {
    type FormulaCalc = GraphCalc & { source: string };
    const formula = (id: string, label: string, source: string): FormulaCalc => ({ id, label, source, references: listFormulaReferences(source) });
    const evaluate = (c: FormulaCalc, inputs: Record<string, Quantity>) => evaluateFormulas({ source: c.source, scope: inputs }).exports;
    const calcs = [
      formula("a", "F1", "w = 12 kN/m\nL = 6 m"),
      formula("b", "F2", "M = F1.w*F1.L^2/8"),
      formula("c", "F3", "sigma = F2.M / (250000 mm^3)"),
    ];
    const first = recomputePackage({ calcs, evaluate });
    expect(first.results.c.exports.sigma).toEqual({ value: 216, unit: "MPa" });
    const edited = [formula("a", "F1", "w = 12 kN/m\nL = 3 m"), calcs[1], calcs[2]];
    const second = recomputePackage({ calcs: edited, evaluate, previous: first, changed: ["a"] });
    expect(second.results.b.exports.M).toEqual({ value: 13.5, unit: "kN*m" });
    expect(second.results.c.exports.sigma).toEqual({ value: 54, unit: "MPa" });
  });
});
