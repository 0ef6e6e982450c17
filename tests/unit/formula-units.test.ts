import { describe, expect, it } from "vitest";
import { evaluateFormulas, type UnitSystem } from "@/lib/solve/formula";

function result(source: string, preferredUnits: UnitSystem = "SI") {
  const r = evaluateFormulas({ source, preferredUnits });
  expect(r.errors).toEqual([]);
  const last = r.lines[r.lines.length - 1];
  if (last.error) throw new Error(last.error.message);
  return last;
}

describe("formula units: results in engineering units", () => {
  it("shows force × length as kN·m rather than the kJ mathjs would print", () => {
    const l = result("M = 12 kN * 3 m");
    expect([l.value, l.unit, l.display]).toEqual([36, "kN*m", "36 kN·m"]);
  });

  it("shows force over area as MPa", () => {
    expect(result("s = 100 kN / 2000 mm^2").unit).toBe("MPa");
  });

  it("shows a product of lengths as mm² and a plain ratio with no unit", () => {
    expect(result("A = 200 mm * 10 mm")).toMatchObject({ value: 2000, unit: "mm^2" });
    expect(result("u = 45 kN / 90 kN")).toMatchObject({ value: 0.5, unit: "" });
    expect(result("k = 5 kN / 10 N")).toMatchObject({ value: 500, unit: "" });
  });

  it("keeps a result in the engineering unit it was written in", () => {
    expect(result("t = 12 mm")).toMatchObject({ value: 12, unit: "mm" });
    expect(result("t = 12 mm\nt2 = 2*t")).toMatchObject({ value: 24, unit: "mm" });
    expect(result("f = 250 N/mm^2")).toMatchObject({ value: 250, unit: "N/mm^2" });
    expect(result("q = 1.5 kPa")).toMatchObject({ value: 1.5, unit: "kPa" });
  });

  it("adds lengths in the first operand's unit", () => {
    expect(result("v = 3 m + 200 mm")).toMatchObject({ value: 3.2, unit: "m" });
  });

  it("converts units of the other system to the package's system", () => {
    expect(result("L = 10 ft")).toMatchObject({ value: 3.048, unit: "m" });
    expect(result("L = 3.048 m", "US")).toMatchObject({ value: 10, unit: "ft" });
  });

  it("gives US packages kip·ft, ksi, kip and kip/ft", () => {
    expect(result("M = 2 kip * 3 ft", "US")).toMatchObject({ value: 6, unit: "kip*ft" });
    expect(result("s = 36 kip / 2 in^2", "US")).toMatchObject({ value: 18, unit: "ksi" });
    expect(result("P = 4448.2216 N", "US")).toMatchObject({ unit: "kip" });
    expect(result("w = 2 kip / 4 ft", "US")).toMatchObject({ value: 0.5, unit: "kip/ft" });
    expect(result("q = 20 psf", "US")).toMatchObject({ value: 20, unit: "psf" });
  });

  it("honours -> unit when the dimension matches", () => {
    expect(result("M = 54 kN*m -> kN*mm")).toMatchObject({ value: 54000, unit: "kN*mm" });
    expect(result("r = 0.045 m -> mm")).toMatchObject({ value: 45, unit: "mm" });
    expect(result("M = 54 kN m -> kN m")).toMatchObject({ value: 54, unit: "kN*m" });
    expect(result("M = 1 kip*ft -> kN*m").value).toBeCloseTo(1.35582, 5);
  });

  it("reports -> unit of another dimension on the line", () => {
    const r = evaluateFormulas({ source: "M = 54 kN*m -> kN" });
    expect(r.errors).toEqual([{ line: 1, message: "cannot show a moment (kN*m) in kN, which is a force on line 1" }]);
  });

  it("reports -> followed by something that is not a unit", () => {
    expect(evaluateFormulas({ source: "M = 5 -> potatoes" }).errors[0].message).toMatch(/^potatoes is not a unit .* on line 1$/);
    expect(evaluateFormulas({ source: "M = 5 ->" }).errors[0].message).toBe("-> needs a unit after it on line 1");
  });

  it("shows -> kN as kN even when the result is a plain number times kN", () => {
    expect(result("n = 3\nP = n * 2 kN -> kN")).toMatchObject({ value: 6, unit: "kN" });
  });

  it("keeps angles in degrees", () => {
    expect(result("a = 30 deg\nb = 2*a")).toMatchObject({ value: 60, unit: "deg" });
    expect(result("a = 1 rad -> deg").value).toBeCloseTo(57.29578, 5);
  });

  it("writes quantities outside the engineering table in SI base units", () => {
    expect(result("p = 10 kN * 2 m / 4 s")).toMatchObject({ value: 5000, unit: "kg*m^2/s^3" });
  });

  it("refuses temperatures with an offset", () => {
    expect(evaluateFormulas({ source: "T = 20 degC" }).errors[0].message).toBe("degC has an offset (like degC); use K for temperatures on line 1");
  });

  it("removes floating-point noise from results", () => {
    expect(result("x = 3 in -> in").value).toBe(3);
  });

  it("reads the US units mathjs lacks: ksi, psf, ksf, plf, klf, pcf", () => {
    expect(result("f = 1 ksi -> psi").value).toBeCloseTo(1000, 9);
    expect(result("q = 1 ksf -> psf").value).toBeCloseTo(1000, 9);
    expect(result("w = 1 klf -> plf").value).toBeCloseTo(1000, 9);
    expect(result("g = 1 pcf -> lbf/ft^3").value).toBeCloseTo(1, 12);
  });
});
