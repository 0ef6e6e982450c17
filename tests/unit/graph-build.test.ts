import { describe, expect, it } from "vitest";
import { isSolveError } from "@/lib/solve/errors";
import { buildCalcGraph, type GraphCalc } from "@/lib/solve/graph";

/** A calc whose id is its lowercased label. */
const calc = (label: string, references: string[] = [], exports?: string[]): GraphCalc => ({
  id: label.toLowerCase(),
  label,
  references,
  ...(exports && { exports }),
});

describe("buildCalcGraph", () => {
  it("orders each calc after the calcs it references", () => {
    const g = buildCalcGraph([calc("F3", ["T1.R_A", "C2"]), calc("C2", ["T1"]), calc("T1")]);
    expect(g.order).toEqual(["t1", "c2", "f3"]);
    expect(g.cycles).toEqual([]);
    expect(g.broken).toEqual([]);
  });

  it("keeps package order wherever references allow it", () => {
    const g = buildCalcGraph([calc("A"), calc("B", ["D"]), calc("C"), calc("D"), calc("E", ["A"])]);
    expect(g.order).toEqual(["a", "c", "d", "b", "e"]);
  });

  it("lists what each calc reads and what reads it", () => {
    const g = buildCalcGraph([calc("T1"), calc("F1", ["T1.x", "T1.y"]), calc("F2", ["T1", "F1.z"])]);
    expect(g.dependsOn).toEqual({ t1: [], f1: ["t1"], f2: ["t1", "f1"] });
    expect(g.dependents).toEqual({ t1: ["f1", "f2"], f1: ["f2"], f2: [] });
  });

  it("reports a reference to a calc that is not in the package on the calc that has it", () => {
    const g = buildCalcGraph([calc("T1"), calc("F2", ["T9.F_U1L2", "T1"])]);
    expect(g.broken).toEqual([{ calc: "f2", reference: "T9.F_U1L2", message: "T9 is not in this package" }]);
    expect(g.order).toEqual(["t1", "f2"]);
  });

  it("reports a value the referenced calc does not export, when its exports are known", () => {
    const g = buildCalcGraph([calc("T1", [], ["R_A"]), calc("F2", ["T1.R_A", "T1.R_Z"])]);
    expect(g.broken).toEqual([{ calc: "f2", reference: "T1.R_Z", message: "T1 has no value R_Z" }]);
  });

  it("reports a cycle on every calc in it, with the path as labels", () => {
    const g = buildCalcGraph([calc("F1"), calc("F3", ["F4.a", "F1"]), calc("F4", ["F3.b"]), calc("F5", ["F4"])]);
    expect(g.cycles).toEqual([
      { calc: "f3", path: ["F3", "F4", "F3"], message: "F3 → F4 → F3" },
      { calc: "f4", path: ["F4", "F3", "F4"], message: "F4 → F3 → F4" },
    ]);
    // The cycle's calcs sit together, after what they read and before what reads them.
    expect(g.order).toEqual(["f1", "f3", "f4", "f5"]);
  });

  it("reports a calc that references itself", () => {
    expect(buildCalcGraph([calc("F1", ["F1.x"])]).cycles).toEqual([{ calc: "f1", path: ["F1", "F1"], message: "F1 → F1" }]);
  });

  it("finds the shortest way around a longer cycle", () => {
    const g = buildCalcGraph([calc("A", ["B"]), calc("B", ["C"]), calc("C", ["A", "D"]), calc("D", ["C"])]);
    expect(g.cycles.find((c) => c.calc === "a")?.message).toBe("A → B → C → A");
    expect(g.cycles.find((c) => c.calc === "d")?.message).toBe("D → C → D");
  });

  it("handles a chain of thousands of calcs without running out of stack", () => {
    const chain = Array.from({ length: 5000 }, (_, i) => calc(`F${i}`, i > 0 ? [`F${i - 1}`] : []));
    const g = buildCalcGraph([...chain].reverse());
    expect(g.order[0]).toBe("f0");
    expect(g.order[4999]).toBe("f4999");
  });

  it.each([
    [[calc("T1"), { ...calc("T2"), id: "t1" }], "calcs[1].id"],
    [[calc("T1"), { ...calc("T1"), id: "other" }], "calcs[1].label"],
    [[{ ...calc("T1"), label: "T.1" }], "calcs[0].label"],
    [[{ ...calc("T1"), id: "" }], "calcs[0].id"],
  ])("refuses duplicate or malformed ids and labels (%#)", (calcs, path) => {
    try {
      buildCalcGraph(calcs);
      throw new Error("expected a SolveError");
    } catch (e) {
      if (!isSolveError(e)) throw e;
      expect([e.code, e.path]).toEqual(["INVALID", path]);
    }
  });
});
