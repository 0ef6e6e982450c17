import { describe, expect, it } from "vitest";
import { evaluateFormulas, listFormulaReferences } from "@/lib/solve/formula";

function lineNamed(source: string, name: string) {
  const found = evaluateFormulas({ source }).lines.find((l) => l.name === name);
  if (!found) throw new Error(`no line ${name}`);
  return found;
}

describe("formula syntax: one assignment per line", () => {
  it("evaluates lines top to bottom, each reading the lines above it", () => {
    const r = evaluateFormulas({ source: "a = 2\nb = a + 3\nc = a*b" });
    expect(r.exports).toEqual({ a: { value: 2, unit: "" }, b: { value: 5, unit: "" }, c: { value: 10, unit: "" } });
    expect(r.lines.map((l) => l.line)).toEqual([1, 2, 3]);
  });

  it("skips blank lines but keeps the source line numbers", () => {
    const r = evaluateFormulas({ source: "\n  \na = 1\n\nb = a" });
    expect(r.lines.map((l) => [l.name, l.line])).toEqual([["a", 3], ["b", 5]]);
  });

  it("treats # as a comment to the end of the line, kept as the line's note", () => {
    const l = lineNamed("L = 6 m  # clear span between bearings", "L");
    expect(l.note).toBe("clear span between bearings");
    expect(l.value).toBe(6);
    expect(l.error ? "" : l.step.text).toContain("clear span between bearings");
  });

  it("keeps a comment-only line as a note between the formulas", () => {
    const r = evaluateFormulas({ source: "# Loads from the roof\nw = 2 kN/m" });
    expect(r.notes).toEqual([{ line: 1, text: "Loads from the roof" }]);
    expect(r.lines).toHaveLength(1);
  });

  it("accepts names of letters, digits and underscores, with a subscript after the first underscore", () => {
    expect(evaluateFormulas({ source: "phi_c = 0.9" }).steps[0].latex).toBe("\\phi_{\\mathrm{c}} = 0.9");
    expect(evaluateFormulas({ source: "F_y = 345 MPa" }).steps[0].latex).toBe("F_{\\mathrm{y}} = 345\\,\\mathrm{MPa}");
    expect(evaluateFormulas({ source: "F_U1L2 = 3 kN" }).steps[0].latex).toMatch(/^F_\{\\mathrm\{U1L2\}\} = /);
  });

  it("allows sqrt, min, max, abs, sin, cos, tan and pi", () => {
    const r = evaluateFormulas({
      source: "a = sqrt(16)\nb = min(3, 1, 2)\nc = max(3, 7)\nd = abs(-4)\ne = sin(30 deg)\nf = cos(60 deg)\ng = tan(45 deg)\nh = pi",
    });
    const v = Object.fromEntries(Object.entries(r.exports).map(([k, q]) => [k, q.value]));
    expect(r.errors).toEqual([]);
    expect(v).toMatchObject({ a: 4, b: 1, c: 7, d: 4 });
    expect(v.e).toBeCloseTo(0.5, 12);
    expect(v.f).toBeCloseTo(0.5, 12);
    expect(v.g).toBeCloseTo(1, 12);
    expect(v.h).toBeCloseTo(Math.PI, 14);
  });

  it("reads a plain number inside sin, cos and tan as radians", () => {
    expect(evaluateFormulas({ source: "s = sin(pi/6)" }).exports.s.value).toBeCloseTo(0.5, 12);
  });

  it("reports a line without = and goes on with the next", () => {
    const r = evaluateFormulas({ source: "just some words\nb = 2" });
    expect(r.errors).toEqual([{ line: 1, message: 'expected "name = expression" on line 1' }]);
    expect(r.exports.b.value).toBe(2);
  });

  it.each([
    ["2x = 3", "2x is not a valid name (letters, digits and _, starting with a letter) on line 1"],
    ["sqrt = 3", "sqrt is reserved (a function or a word of the syntax); choose another name on line 1"],
    ["pi = 3", "pi is reserved (a function or a word of the syntax); choose another name on line 1"],
    ["T1.F = 3", "T1.F cannot be assigned: a dotted name refers to a value of another calc on line 1"],
    [" = 3", "a name is needed before = on line 1"],
    ["a = ", "nothing after = on line 1"],
    ["a = 1 = 2", "only one = per line on line 1"],
    ["a = 5 %", '"%" is not part of the formula syntax on line 1'],
    ["a = [1, 2]", '"[" is not part of the formula syntax on line 1'],
    ["a = 3!", '"!" is not part of the formula syntax on line 1'],
    ["a = 0x1F", "numbers are written in decimal on line 1"],
    ["a = 3 m to ft", 'the operator "to" is not part of the formula syntax on line 1'],
    ["a = 2 mod 3", 'the operator "mod" is not part of the formula syntax on line 1'],
    ["a = f(2)", "unknown function f on line 1"],
    ["a = sqrt(1, 2)", "sqrt takes 1 value, not 2 on line 1"],
    ["a = sqrt", "sqrt is a function: write sqrt(…) on line 1"],
  ])("refuses %j with a message", (source, message) => {
    expect(evaluateFormulas({ source }).errors).toEqual([{ line: 1, message }]);
  });

  it("reports an expression it cannot read", () => {
    const [e] = evaluateFormulas({ source: "a = (2 + 3" }).errors;
    expect(e.message).toMatch(/^cannot read the expression: .+ on line 1$/);
  });

  it("refuses to assign a name twice", () => {
    const r = evaluateFormulas({ source: "a = 1\na = 2\nb = a" });
    expect(r.errors).toEqual([{ line: 2, message: "a is defined twice (lines 1 and 2)" }]);
    expect(r.exports.b.value).toBe(1);
  });

  it("accepts Windows line endings", () => {
    expect(evaluateFormulas({ source: "a = 1\r\nb = a + 1\r\n" }).exports.b.value).toBe(2);
  });
});

describe("listFormulaReferences", () => {
  it("lists the dotted references of other calcs once each, in order of first use, ignoring comments", () => {
    const source = "F = T1.F_U1L2 * 2  # not T7.x\nG = T2.R_A + T1.F_U1L2\n# T9.y in a note\nH = 3.5 m";
    expect(listFormulaReferences(source)).toEqual(["T1.F_U1L2", "T2.R_A"]);
  });
});
