import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { aisc360 } from "@/lib/solve/design";
import { rendersAll, invalidPath } from "../support/solve-assertions";

describe("aisc360.tension", () => {
  it("is governed by yielding when the net section is close to the gross section", () => {
    const r = aisc360.tension({ Fy: 50, Fu: 65, Ag: 4, An: 4, U: 1 });
    expect(r.governs).toBe("yielding");
    expect(r.phiPn).toBe(r.phiPnYield);
    expect(r.phiPnRupture).toBeGreaterThan(r.phiPnYield);
  });

  it("is governed by rupture when shear lag cuts the effective net area", () => {
    const r = aisc360.tension({ Fy: 50, Fu: 65, Ag: 4, An: 3.5, U: 0.6 });
    expect(r.Ae).toBeCloseTo(3.5 * 0.6, 12);
    expect(r.governs).toBe("rupture");
    expect(r.phiPn).toBe(r.phiPnRupture);
  });

  it("gives allowable strengths Pn/Ω no larger than the design strengths", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 30, max: 100, noNaN: true }),
        fc.double({ min: 0.1, max: 1, noNaN: true }),
        fc.double({ min: 0.3, max: 1, noNaN: true }),
        (Fy, anOverAg, U) => {
          const r = aisc360.tension({ Fy, Fu: Fy * 1.3, Ag: 10, An: 10 * anOverAg, U });
          expect(r.asd.PnOmega).toBeLessThan(r.phiPn);
          expect(r.phiPn).toBeLessThanOrEqual(Math.min(r.phiPnYield, r.phiPnRupture));
        },
      ),
    );
  });

  it("names the field for a net area above the gross area, U above 1 and a negative stress", () => {
    expect(invalidPath(() => aisc360.tension({ Fy: 50, Fu: 65, Ag: 2, An: 2.5, U: 1 }))).toBe("An");
    expect(invalidPath(() => aisc360.tension({ Fy: 50, Fu: 65, Ag: 2, An: 2, U: 1.1 }))).toBe("U");
    expect(invalidPath(() => aisc360.tension({ Fy: -50, Fu: 65, Ag: 2, An: 2, U: 1 }))).toBe("Fy");
    expect(invalidPath(() => aisc360.tension({ Fy: 50, Fu: Number.NaN, Ag: 2, An: 2, U: 1 }))).toBe("Fu");
  });

  it("writes steps that KaTeX renders, in the units asked for", () => {
    const r = aisc360.tension({ Fy: 345, Fu: 450, Ag: 2500, An: 2200, U: 0.85, units: "N-mm" });
    rendersAll(r.steps);
    expect(r.steps[1].latex).toContain("\\mathrm{MPa}");
    expect(r.steps[1].latex).toContain("\\mathrm{N}");
  });
});

describe("aisc360.compression", () => {
  const E = 29000;

  it("uses E3-2 up to 4.71√(E/Fy) and E3-3 beyond", () => {
    const limit = 4.71 * Math.sqrt(E / 50);
    expect(aisc360.compression({ Fy: 50, E, KLr: limit - 0.01 }).equation).toBe("E3-2");
    expect(aisc360.compression({ Fy: 50, E, KLr: limit + 0.01 }).equation).toBe("E3-3");
  });

  it("is nearly continuous where E3-2 hands over to E3-3", () => {
    const limit = 4.71 * Math.sqrt(E / 50);
    const below = aisc360.compression({ Fy: 50, E, KLr: limit }).Fcr;
    const above = aisc360.compression({ Fy: 50, E, KLr: limit + 1e-9 }).Fcr;
    expect(Math.abs(below - above) / below).toBeLessThan(1e-3);
  });

  it("gives Fcr = Fy and no Fe at zero slenderness", () => {
    const r = aisc360.compression({ Fy: 50, E, KLr: 0 });
    expect(r.Fe).toBeNull();
    expect(r.Fcr).toBe(50);
    expect(r.equation).toBe("E3-2");
    rendersAll(r.steps);
  });

  it("never increases with slenderness and never exceeds Fy", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 300, noNaN: true }), fc.double({ min: 0, max: 50, noNaN: true }), (a, d) => {
        const lo = aisc360.compression({ Fy: 50, E, KLr: a });
        const hi = aisc360.compression({ Fy: 50, E, KLr: a + d });
        expect(hi.Fcr).toBeLessThanOrEqual(lo.Fcr + 1e-9);
        expect(lo.Fcr).toBeLessThanOrEqual(50);
        expect(lo.phiFcr).toBeCloseTo(0.9 * lo.Fcr, 12);
      }),
    );
  });

  it("warns above KL/r = 200 without refusing", () => {
    expect(aisc360.compression({ Fy: 50, E, KLr: 200 }).warnings).toEqual([]);
    const r = aisc360.compression({ Fy: 50, E, KLr: 250 });
    expect(r.warnings).toHaveLength(1);
    expect(r.steps.some((s) => s.text?.startsWith("Warning"))).toBe(true);
    rendersAll(r.steps);
  });

  it("names the field for a negative slenderness", () => {
    expect(invalidPath(() => aisc360.compression({ Fy: 50, E, KLr: -1 }))).toBe("KLr");
    expect(invalidPath(() => aisc360.compression({ Fy: 50, E: 0, KLr: 10 }))).toBe("E");
  });

  it("writes steps that KaTeX renders for both equations", () => {
    rendersAll(aisc360.compression({ Fy: 50, E, KLr: 60 }).steps);
    rendersAll(aisc360.compression({ Fy: 50, E, KLr: 160 }).steps);
  });
});
