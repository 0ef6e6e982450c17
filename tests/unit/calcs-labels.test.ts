import { describe, expect, it } from "vitest";
import { calcDefaults } from "@/lib/calcs/calc-defaults";
import { calcKinds } from "@/lib/calcs/calc-types";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import { nextCalcLabel } from "@/lib/calcs/next-calc-label";

describe("nextCalcLabel", () => {
  it("starts each kind at 1 with its own prefix", () => {
    expect(calcKinds.map((k) => nextCalcLabel(k, []))).toEqual(["T1", "S1", "J1", "F1", "C1", "M1", "D1"]);
  });

  it("takes one more than the highest number of that prefix", () => {
    expect(nextCalcLabel("truss", ["T1", "T2", "S1"])).toBe("T3");
    expect(nextCalcLabel("formula", ["F1", "F7", "T9"])).toBe("F8");
  });

  it("does not reuse the label of a deleted calc, so references to it stay broken", () => {
    expect(nextCalcLabel("truss", ["T1", "T3"])).toBe("T4");
  });

  it("ignores renamed labels that merely start with the prefix", () => {
    expect(nextCalcLabel("truss", ["TopChord", "T1_alt", "T2"])).toBe("T3");
  });
});

describe("extractCalcs", () => {
  it("finds calc nodes in document order, nested ones included", () => {
    const doc = {
      type: "doc",
      content: [
        { type: "paragraph", content: [{ type: "text", text: "x" }] },
        { type: "truss", attrs: { id: "id-truss-0001", label: "T1", inputs: { a: 1 } } },
        { type: "bulletList", content: [{ type: "listItem", content: [{ type: "formula", attrs: { id: "id-formula-0001", label: "F1", inputs: { source: "" } } }] }] },
        { type: "deflection", attrs: { id: "id-deflect-0001", label: "D1", inputs: null } },
      ],
    };
    expect(extractCalcs(doc).map((c) => [c.kind, c.label])).toEqual([
      ["truss", "T1"],
      ["formula", "F1"],
      ["deflection", "D1"],
    ]);
    expect(extractCalcs(doc)[0]).toEqual({ id: "id-truss-0001", kind: "truss", label: "T1", inputs: { a: 1 } });
  });

  it("returns nothing for something that is not a document", () => {
    expect(extractCalcs(null)).toEqual([]);
    expect(extractCalcs("doc")).toEqual([]);
    expect(extractCalcs({ type: "doc", content: [{ type: "truss" }] })).toEqual([]);
  });
});

describe("calcDefaults", () => {
  it("gives every kind inputs that evaluate, together, without a problem", () => {
    const calcs = calcKinds.map((kind) => ({ id: `default-${kind}`, kind, label: nextCalcLabel(kind, []), inputs: calcDefaults(kind) }));
    const evaluation = evaluateCalcs({ calcs });
    expect(Object.values(evaluation.results).filter((r) => r.status !== "ok").map((r) => [r.label, r.messages, r.fieldErrors])).toEqual([]);
  });

  it("returns a fresh object each time", () => {
    expect(calcDefaults("truss")).not.toBe(calcDefaults("truss"));
  });
});
