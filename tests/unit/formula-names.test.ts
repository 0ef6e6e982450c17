import { describe, expect, it } from "vitest";
import { evaluateFormulas } from "@/lib/solve/formula";

const values = (source: string) => evaluateFormulas({ source }).exports;

describe("formula names: user variables are never taken for units", () => {
  it.each(["L", "A", "N", "m", "b", "g", "s", "h", "t", "E", "T", "K"])(
    "uses a variable named %s, which is also a unit name, as the variable",
    (name) => {
      const r = evaluateFormulas({ source: `${name} = 4\nx = 3*${name}\ny = 2 ${name}\nz = ${name}^2/${name}` });
      expect(r.errors).toEqual([]);
      expect(r.exports.x).toEqual({ value: 12, unit: "" });
      expect(r.exports.y).toEqual({ value: 8, unit: "" });
      expect(r.exports.z).toEqual({ value: 4, unit: "" });
    },
  );

  it("keeps a span called L a length: w*L^2/8 is a moment, not litres", () => {
    const r = evaluateFormulas({ source: "w = 12 kN/m\nL = 6 m\nM = w*L^2/8" });
    expect(r.exports.M).toEqual({ value: 54, unit: "kN*m" });
  });

  it("reads an area called A as the area in P/A, not amperes", () => {
    const r = evaluateFormulas({ source: "P = 100 kN\nA = 2000 mm^2\nsigma = P/A" });
    expect(r.exports.sigma).toEqual({ value: 50, unit: "MPa" });
  });

  it("reads a name written right after a number as its unit when no variable has that name", () => {
    expect(values("L = 6 m").L).toEqual({ value: 6, unit: "m" });
    expect(values("w = 12 kN/m").w).toEqual({ value: 12, unit: "kN/m" });
    expect(values("A = 2000 mm^2").A).toEqual({ value: 2000, unit: "mm^2" });
    expect(values("M = 5 kN m").M).toEqual({ value: 5, unit: "kN*m" });
    expect(values("M = 5 kN*m").M).toEqual({ value: 5, unit: "kN*m" });
    expect(values("q = 3 kN/m^2").q).toEqual({ value: 3, unit: "kN/m^2" });
    expect(values("P = -5 kN").P).toEqual({ value: -5, unit: "kN" });
    expect(values("P = 1.5e3 N").P).toEqual({ value: 1500, unit: "N" });
  });

  it("uses a variable even right after a number, where a unit of that name could stand", () => {
    // m is the author's variable here, so `3 m` is three times it, not three metres.
    const r = evaluateFormulas({ source: "m = 2\nd = 3 m" });
    expect(r.exports.d).toEqual({ value: 6, unit: "" });
  });

  it("reports a name nobody defined instead of guessing a unit", () => {
    const r = evaluateFormulas({ source: "P = 100 kN\nsigma = P/A" });
    expect(r.errors).toEqual([{ line: 2, message: "unknown name A (a unit is written after a number, e.g. 1 A) on line 2" }]);
  });

  it("reports an unknown name that is no unit either", () => {
    expect(evaluateFormulas({ source: "x = 2*span" }).errors).toEqual([{ line: 1, message: "unknown name span on line 1" }]);
  });

  it("reports a unit written on its own, without a number", () => {
    expect(evaluateFormulas({ source: "x = kN" }).errors[0].message).toBe(
      "unknown name kN (a unit is written after a number, e.g. 1 kN) on line 1",
    );
  });

  it("does not read a unit after a variable: a unit follows a number", () => {
    const r = evaluateFormulas({ source: "n = 4\nP = n kN\nQ = n*1 kN" });
    expect(r.errors.map((e) => e.line)).toEqual([2]);
    expect(r.exports.Q).toEqual({ value: 4, unit: "kN" });
  });

  it("reads an unknown name after a number as an unknown name, not a unit", () => {
    expect(evaluateFormulas({ source: "x = 3 kNN" }).errors[0].message).toBe("unknown name kNN on line 1");
  });
});
