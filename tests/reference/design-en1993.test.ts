import { describe, expect, it } from "vitest";
import { en1993, imperfectionFactors } from "@/lib/solve/design";

describe("EN 1993-1-1:2005 Table 6.1 imperfection factors", () => {
  it.each([
    ["a0", 0.13], // Source: EN 1993-1-1:2005 Table 6.1
    ["a", 0.21], // Source: EN 1993-1-1:2005 Table 6.1
    ["b", 0.34], // Source: EN 1993-1-1:2005 Table 6.1
    ["c", 0.49], // Source: EN 1993-1-1:2005 Table 6.1
    ["d", 0.76], // Source: EN 1993-1-1:2005 Table 6.1
  ] as const)("curve %s has α = %d", (curve, alpha) => {
    expect(imperfectionFactors[curve]).toBe(alpha);
    expect(en1993.bucklingReduction({ lambdaBar: 1, curve }).alpha).toBe(alpha);
  });
});

describe("χ against tabulated values of Eq. 6.49 (Figure 6.4 plots them; the tabulation is from memory)", () => {
  it.each([
    ["a", 1.0, 0.6656], // Source: χ tables for EN 1993-1-1 Eq. 6.49 (from memory)
    ["b", 1.0, 0.597], // Source: χ tables for EN 1993-1-1 Eq. 6.49 (from memory)
    ["c", 1.0, 0.5399], // Source: χ tables for EN 1993-1-1 Eq. 6.49 (from memory)
    ["d", 1.0, 0.4671], // Source: χ tables for EN 1993-1-1 Eq. 6.49 (from memory)
    ["b", 0.5, 0.8842], // Source: χ tables for EN 1993-1-1 Eq. 6.49 (from memory)
    ["c", 0.5, 0.843], // Source: χ tables for EN 1993-1-1 Eq. 6.49 (from memory)
    ["b", 1.5, 0.3422], // Source: χ tables for EN 1993-1-1 Eq. 6.49 (from memory)
    ["c", 2.0, 0.1962], // Source: χ tables for EN 1993-1-1 Eq. 6.49 (from memory)
  ] as const)("curve %s at λ̄ = %d gives χ = %d", (curve, lambdaBar, chi) => {
    expect(en1993.bucklingReduction({ lambdaBar, curve }).chi).toBeCloseTo(chi, 3);
  });

  it("curve b at λ̄ = 1.0 by hand", () => {
    const r = en1993.bucklingReduction({ lambdaBar: 1, curve: "b" });
    expect(r.Phi).toBeCloseTo(1.136, 12); // Source: EN 1993-1-1 §6.3.1.2, 0.5[1 + 0.34 × 0.8 + 1] (closed form)
  });
});

describe("EN 1993-1-1 §6.3.1 buckling resistance by hand", () => {
  it("λ1 = 93.9 for fy = 235 MPa", () => {
    const r = en1993.compressionResistance({ A: 1000, fy: 235, E: 210000, Lcr: 1000, i: 10, curve: "b" });
    expect(r.lambda1).toBeCloseTo(93.9, 1); // Source: EN 1993-1-1:2005 §6.3.1.3(1), λ1 = 93.9ε
  });

  it("A = 2000 mm², S355, Lcr = 3.0 m, i = 30 mm, curve c", () => {
    const r = en1993.compressionResistance({ A: 2000, fy: 355, E: 210000, Lcr: 3000, i: 30, curve: "c" });
    expect(r.lambda1).toBeCloseTo(76.41, 2); // Source: EN 1993-1-1 §6.3.1.3, π√(210 000/355) (closed form)
    expect(r.lambdaBar).toBeCloseTo(1.3087, 4); // Source: EN 1993-1-1 Eq. 6.50, (3000/30)/76.41 (closed form)
    expect(r.Phi).toBeCloseTo(1.628, 3); // Source: EN 1993-1-1 §6.3.1.2, 0.5[1 + 0.49 × 1.1087 + 1.3087²] (closed form)
    expect(r.chi).toBeCloseTo(0.3851, 4); // Source: EN 1993-1-1 Eq. 6.49 (closed form)
    expect(r.NbRd / 1000).toBeCloseTo(273.5, 1); // Source: EN 1993-1-1 Eq. 6.47, 0.3851 × 2000 × 355 / 1.0 N (closed form)
  });
});

describe("EN 1993-1-1 §6.2.3 tension resistance by hand", () => {
  it("A = 1000 mm², Anet = 800 mm², S355 (fu = 490 MPa)", () => {
    const r = en1993.tensionResistance({ A: 1000, fy: 355, Anet: 800, fu: 490 });
    expect(r.NplRd).toBeCloseTo(355000, 6); // Source: EN 1993-1-1 Eq. 6.6, 1000 × 355 / 1.00 (closed form)
    expect(r.NuRd).toBeCloseTo(282240, 6); // Source: EN 1993-1-1 Eq. 6.7, 0.9 × 800 × 490 / 1.25 (closed form)
    expect(r.governs).toBe("rupture");
  });
});
