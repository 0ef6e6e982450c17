import { describe, expect, it } from "vitest";
import { affectedBy, buildCalcGraph, type GraphCalc } from "@/lib/solve/graph";

const calc = (label: string, references: string[] = []): GraphCalc => ({ id: label.toLowerCase(), label, references });

// T1 → C1 → D1, T1 → D2; T2 → D3 (independent); F1 reads D1 and D3.
const pkg = buildCalcGraph([
  calc("T1"),
  calc("T2"),
  calc("C1", ["T1.R_A"]),
  calc("D1", ["C1.U"]),
  calc("D2", ["T1.F_top"]),
  calc("D3", ["T2"]),
  calc("F1", ["D1.U", "D3.U"]),
]);

describe("affectedBy", () => {
  it("returns the changed calc and everything downstream of it, in evaluation order", () => {
    expect(affectedBy(pkg, ["t1"])).toEqual(["t1", "c1", "d1", "d2", "f1"]);
  });

  it("leaves out what the changed calc reads and what is beside it", () => {
    expect(affectedBy(pkg, ["c1"])).toEqual(["c1", "d1", "f1"]);
  });

  it("returns only the calc itself when nothing reads it", () => {
    expect(affectedBy(pkg, ["d2"])).toEqual(["d2"]);
  });

  it("merges several changes without repeating a calc", () => {
    expect(affectedBy(pkg, ["d3", "d1", "d3"])).toEqual(["d1", "d3", "f1"]);
  });

  it("ignores ids that are not in the package", () => {
    expect(affectedBy(pkg, ["gone", "t2"])).toEqual(["t2", "d3", "f1"]);
    expect(affectedBy(pkg, [])).toEqual([]);
  });

  it("includes every calc of a cycle when one of them changes", () => {
    const g = buildCalcGraph([calc("A", ["B"]), calc("B", ["A"]), calc("C", ["B"]), calc("D")]);
    expect(affectedBy(g, ["a"])).toEqual(["a", "b", "c"]);
  });
});
