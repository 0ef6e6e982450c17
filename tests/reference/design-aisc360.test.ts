import { describe, expect, it } from "vitest";
import { aisc360, checkMember } from "@/lib/solve/design";

describe("AISC 360-16 §E3 against AISC Manual Table 4-14 (Fy = 50 ksi)", () => {
  it.each([
    [0, 45.0], // Source: AISC Steel Construction Manual 15th ed., Table 4-14 (from memory)
    [25, 43.0], // Source: AISC Steel Construction Manual 15th ed., Table 4-14 (from memory)
    [50, 37.5], // Source: AISC Steel Construction Manual 15th ed., Table 4-14 (from memory)
    [100, 21.7], // Source: AISC Steel Construction Manual 15th ed., Table 4-14 (from memory)
    [150, 10.0], // Source: AISC Steel Construction Manual 15th ed., Table 4-14 (from memory)
    [200, 5.65], // Source: AISC Steel Construction Manual 15th ed., Table 4-14 (from memory)
  ])("KL/r = %d gives φcFcr ≈ %d ksi", (KLr, phiFcr) => {
    expect(aisc360.compression({ Fy: 50, E: 29000, KLr }).phiFcr).toBeCloseTo(phiFcr, 1);
  });
});

describe("AISC 360-16 §E3 by hand", () => {
  it("KL/r = 100, Fy = 50 ksi: inelastic buckling", () => {
    const r = aisc360.compression({ Fy: 50, E: 29000, KLr: 100 });
    expect(r.Fe).toBeCloseTo(28.62, 2); // Source: AISC 360-16 Eq. E3-4, π² × 29 000 / 100² (closed form)
    expect(r.equation).toBe("E3-2"); // Source: AISC 360-16 §E3(a), 100 ≤ 4.71√(29 000/50) = 113.4
    expect(r.Fcr).toBeCloseTo(24.07, 2); // Source: AISC 360-16 Eq. E3-2, 0.658^(50/28.62) × 50 (closed form)
  });

  it("KL/r = 150, Fy = 50 ksi: elastic buckling", () => {
    const r = aisc360.compression({ Fy: 50, E: 29000, KLr: 150 });
    expect(r.equation).toBe("E3-3"); // Source: AISC 360-16 §E3(b)
    expect(r.Fcr).toBeCloseTo(11.16, 2); // Source: AISC 360-16 Eq. E3-3, 0.877 × π² × 29 000 / 150² (closed form)
  });

  it("puts the E3-2/E3-3 limit at KL/r = 113.4 for Fy = 50 ksi", () => {
    expect(aisc360.compression({ Fy: 50, E: 29000, KLr: 1 }).inelasticLimit).toBeCloseTo(113.4, 1); // Source: AISC 360-16 §E3, 4.71√(E/Fy) (closed form)
  });
});

describe("AISC 360-16 §D2 by hand", () => {
  it("Fy = 36, Fu = 58 ksi, Ag = 3.75 in², An = 3.00 in², U = 0.80", () => {
    const r = aisc360.tension({ Fy: 36, Fu: 58, Ag: 3.75, An: 3.0, U: 0.8 });
    expect(r.Ae).toBeCloseTo(2.4, 12); // Source: AISC 360-16 Eq. D3-1, 3.00 × 0.80 (closed form)
    expect(r.phiPnYield).toBeCloseTo(121.5, 9); // Source: AISC 360-16 Eq. D2-1, 0.90 × 36 × 3.75 (closed form)
    expect(r.phiPnRupture).toBeCloseTo(104.4, 9); // Source: AISC 360-16 Eq. D2-2, 0.75 × 58 × 2.40 (closed form)
    expect(r.governs).toBe("rupture");
    expect(r.asd.PnOmegaYield).toBeCloseTo(80.84, 2); // Source: AISC 360-16 §D2(a), 36 × 3.75 / 1.67 (closed form)
    expect(r.asd.PnOmegaRupture).toBeCloseTo(69.6, 9); // Source: AISC 360-16 §D2(b), 58 × 2.40 / 2.00 (closed form)
  });

  it("checks an L4×4×1/4 strut, 8 ft, A36, by dimensions", () => {
    const r = checkMember({ material: "steel-aisc360", Fy: 36, Fu: 58, E: 29000, force: -20, length: 96, section: { shape: "angle", d: 4, b: 4, t: 0.25 } });
    expect(r.slenderness).toBeCloseTo(120.7, 1); // Source: 96 in / rz = 0.795 in (rz computed, cf. AISC Manual Table 1-7, from memory)
    expect(r.capacity).toBeCloseTo(29.14, 1); // Source: AISC 360-16 Eq. E3-2 and E3-1, Fcr = 0.658^(36/19.64) × 36 = 16.71 ksi, 0.90 × 16.71 × 1.9375 (closed form)
  });
});
