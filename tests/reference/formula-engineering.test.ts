import { describe, expect, it } from "vitest";
import { evaluateFormulas, type UnitSystem } from "@/lib/solve/formula";

function exportsOf(source: string, preferredUnits: UnitSystem = "SI") {
  const r = evaluateFormulas({ source, preferredUnits });
  expect(r.errors).toEqual([]);
  return r.exports;
}

/** |actual − expected| within `rel` of |expected|. */
function expectWithin(actual: number, expected: number, rel: number) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}

describe("formula reference values", () => {
  it("simply supported beam under a uniform load: M = wL²/8 and R = wL/2", () => {
    const v = exportsOf("w = 12 kN/m\nL = 6 m\nM = w*L^2/8\nR = w*L/2");
    // closed form: 12 × 6² / 8 = 54 kN·m; 12 × 6 / 2 = 36 kN
    expect(v.M).toEqual({ value: 54, unit: "kN*m" });
    expect(v.R).toEqual({ value: 36, unit: "kN" });
  });

  it("axial stress σ = P/A with P = 100 kN and A = 2000 mm²", () => {
    // closed form: 100 000 N / 2000 mm² = 50 N/mm² = 50 MPa
    expect(exportsOf("P = 100 kN\nA = 2000 mm^2\nsigma = P/A").sigma).toEqual({ value: 50, unit: "MPa" });
  });

  it("US beam: w = 1.2 kip/ft over L = 20 ft gives 60 kip·ft", () => {
    // closed form: 1.2 × 20² / 8 = 60 kip·ft
    const v = exportsOf("w = 1.2 kip/ft\nL = 20 ft\nM = w*L^2/8", "US");
    expect(v.M.unit).toBe("kip*ft");
    expectWithin(v.M.value, 60, 1e-12);
  });

  it("Euler load of a pinned column: P_cr = π²EI/L²", () => {
    const v = exportsOf("E = 200 GPa\nI = 8000000 mm^4\nL = 4 m\nP_cr = pi^2*E*I/L^2");
    // closed form: π² × 200 000 N/mm² × 8×10⁶ mm⁴ / (4000 mm)² = π² × 100 kN = 986.960 kN
    expect(v.P_cr.unit).toBe("kN");
    expectWithin(v.P_cr.value, Math.PI ** 2 * 100, 1e-12);
  });

  it("1 ft = 0.3048 m and 1 in = 25.4 mm", () => {
    // Source: NIST SP 811 (2008), Appendix B.9 — foot 3.048 E−01 m, inch 2.54 E−02 m (exact)
    expectWithin(exportsOf("L = 1 ft -> m").L.value, 0.3048, 1e-14);
    expectWithin(exportsOf("t = 1 in -> mm").t.value, 25.4, 1e-14);
  });

  it("1 kip = 4.448222 kN", () => {
    // Source: NIST SP 811 (2008), Appendix B.9 — kip (1 kip = 1000 lbf) 4.448 222 E+03 N
    expectWithin(exportsOf("P = 1 kip -> kN").P.value, 4.448222, 1e-6);
  });

  it("1 kip·ft = 1.355818 kN·m, both ways", () => {
    // Source: NIST SP 811 (2008), Appendix B.9 — foot pound-force 1.355 818 E+00 J
    expectWithin(exportsOf("M = 1 kip*ft -> kN*m").M.value, 1.355818, 1e-6);
    expectWithin(exportsOf("M = 1.355818 kN*m", "US").M.value, 1, 1e-6);
  });

  it("1 ksi = 6.894757 MPa", () => {
    // Source: NIST SP 811 (2008), Appendix B.9 — kip per square inch (ksi) 6.894 757 E+06 Pa
    expectWithin(exportsOf("F_y = 1 ksi -> MPa").F_y.value, 6.894757, 1e-6);
    // 50 ksi steel in SI: 50 × 6.894757 = 344.74 MPa
    expectWithin(exportsOf("F_y = 50 ksi").F_y.value, 344.7379, 1e-6);
  });

  it("1 psf = 47.88026 Pa", () => {
    // Source: NIST SP 811 (2008), Appendix B.9 — pound-force per square foot 4.788 026 E+01 Pa
    expectWithin(exportsOf("q = 1 psf -> Pa").q.value, 47.88026, 1e-6);
  });
});
