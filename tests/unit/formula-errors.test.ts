import { describe, expect, it } from "vitest";
import { isSolveError } from "@/lib/solve/errors";
import { evaluateFormulas, type EvaluateFormulasOptions } from "@/lib/solve/formula";

const errorsOf = (source: string) => evaluateFormulas({ source }).errors;

describe("formula errors are reported on their line", () => {
  it("reports adding a force to a length, naming both", () => {
    expect(errorsOf("x = 12 kN + 3 m")).toEqual([{ line: 1, message: "cannot add a force (kN) and a length (m) on line 1" }]);
  });

  it("reports subtracting a plain number from a length", () => {
    expect(errorsOf("L = 6 m\nx = L - 2")).toEqual([{ line: 2, message: "cannot subtract a plain number from a length (m) on line 2" }]);
  });

  it("reports comparing values of different kinds in min and max", () => {
    expect(errorsOf("x = min(3 kN, 2 m)")[0].message).toBe("min needs values of one kind, not a force (kN) and a length (m) on line 1");
  });

  it("reports a unit in an exponent", () => {
    expect(errorsOf("x = 2^(3 m)")[0].message).toBe("an exponent must be a plain number, not a length (m) on line 1");
  });

  it("reports sin of a length", () => {
    expect(errorsOf("x = sin(3 m)")[0].message).toBe("sin needs an angle (e.g. 30 deg) or a plain number in radians, not a length (m) on line 1");
  });

  it("reports division by zero instead of an infinite result", () => {
    expect(errorsOf("a = 0 m\nx = 5 kN / a")).toEqual([{ line: 2, message: "division by zero on line 2" }]);
  });

  it("reports the square root of a negative value instead of NaN", () => {
    expect(errorsOf("x = sqrt(-4)")).toEqual([{ line: 1, message: "sqrt of a negative value on line 1" }]);
  });

  it("reports a negative base to a fractional power", () => {
    expect(errorsOf("x = (-8)^(1/3)")[0].message).toBe("a negative value to the power 0.3333333333333333 has no real result on line 1");
  });

  it("reports results too large to represent", () => {
    expect(errorsOf("x = 10^400")[0].message).toBe("the result is too large to represent on line 1");
    expect(errorsOf("x = 1e400")[0].message).toBe("a number is too large on line 1");
  });

  it("reports on later lines that they depend on the line with the error, and keeps the independent ones", () => {
    const r = evaluateFormulas({ source: "a = 12 kN + 3 m\nb = 2*a\nc = b + 1 kN\nd = 4 kN" });
    expect(r.errors).toEqual([
      { line: 1, message: "cannot add a force (kN) and a length (m) on line 1" },
      { line: 2, message: "depends on line 1 which has an error" },
      { line: 3, message: "depends on line 2 which has an error" },
    ]);
    expect(r.exports).toEqual({ d: { value: 4, unit: "kN" } });
  });

  it("reports a dependency on a line with nothing after =", () => {
    expect(errorsOf("a =\nb = a")[1]).toEqual({ line: 2, message: "depends on line 1 which has an error" });
  });

  it("keeps the failed line's name, note and typeset expression where it has them", () => {
    const [line] = evaluateFormulas({ source: "x = 12 kN + 3 m  # wrong on purpose" }).lines;
    expect(line).toMatchObject({ name: "x", note: "wrong on purpose", expressionLatex: "12\\,\\mathrm{kN} + 3\\,\\mathrm{m}" });
    expect(line.value).toBeUndefined();
  });

  it("puts only lines that evaluated into steps and exports", () => {
    const r = evaluateFormulas({ source: "a = 1\nb = nope\nc = 3" });
    expect(r.steps.map((s) => s.latex)).toEqual(["a = 1", "c = 3"]);
    expect(Object.keys(r.exports)).toEqual(["a", "c"]);
  });
});

describe("formula options supplied by the caller", () => {
  function solveErrorOf(options: EvaluateFormulasOptions): { code: string; path?: string } {
    try {
      evaluateFormulas(options);
    } catch (e) {
      if (isSolveError(e)) return { code: e.code, path: e.path };
      throw e;
    }
    throw new Error("expected a SolveError");
  }

  it("refuses a source that is not text", () => {
    expect(solveErrorOf({ source: 42 as unknown as string })).toEqual({ code: "INVALID", path: "source" });
  });

  it("refuses an unknown unit system", () => {
    expect(solveErrorOf({ source: "", preferredUnits: "metric" as unknown as "SI" })).toEqual({ code: "INVALID", path: "preferredUnits" });
  });

  it("refuses scope values that are not finite or whose unit cannot be read", () => {
    expect(solveErrorOf({ source: "", scope: { "T1.F": { value: Number.NaN, unit: "kN" } } })).toEqual({ code: "INVALID", path: "scope.T1.F.value" });
    expect(solveErrorOf({ source: "", scope: { "T1.F": { value: 1, unit: "bananas" } } })).toEqual({ code: "INVALID", path: "scope.T1.F.unit" });
    expect(solveErrorOf({ source: "", scope: { "T1.F.x": { value: 1, unit: "" } } })).toEqual({ code: "INVALID", path: "scope.T1.F.x" });
  });

  it("refuses a source longer than 2000 lines", () => {
    expect(solveErrorOf({ source: "a = 1\n".repeat(2001) })).toEqual({ code: "INVALID", path: "source" });
  });
});
