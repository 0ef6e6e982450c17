import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { en1993 } from "@/lib/solve/design";
import type { BucklingCurve } from "@/lib/solve/design";
import { rendersAll, invalidPath } from "../support/solve-assertions";

const CURVES: BucklingCurve[] = ["a0", "a", "b", "c", "d"];

describe("en1993.bucklingReduction", () => {
  it("is 1.0 up to λ̄ = 0.2 on every curve", () => {
    for (const curve of CURVES) {
      for (const lambdaBar of [0, 0.1, 0.2]) expect(en1993.bucklingReduction({ lambdaBar, curve }).chi).toBeCloseTo(1, 12);
    }
  });

  it("orders the curves a0 ≥ a ≥ b ≥ c ≥ d at any slenderness", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.21, max: 4, noNaN: true }), (lambdaBar) => {
        const chis = CURVES.map((curve) => en1993.bucklingReduction({ lambdaBar, curve }).chi);
        for (let i = 1; i < chis.length; i++) expect(chis[i]).toBeLessThan(chis[i - 1]);
      }),
    );
  });

  it("satisfies Eq. 6.49 written the other way: χ²λ̄² − 2χΦ + 1 = 0 when χ < 1", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.25, max: 5, noNaN: true }), fc.constantFrom(...CURVES), (lambdaBar, curve) => {
        const { chi, Phi } = en1993.bucklingReduction({ lambdaBar, curve });
        expect(chi * chi * lambdaBar * lambdaBar - 2 * chi * Phi + 1).toBeCloseTo(0, 9);
      }),
    );
  });

  it("rejects a negative slenderness and an unknown curve", () => {
    expect(invalidPath(() => en1993.bucklingReduction({ lambdaBar: -0.1, curve: "b" }))).toBe("lambdaBar");
    expect(invalidPath(() => en1993.bucklingReduction({ lambdaBar: 1, curve: "e" as BucklingCurve }))).toBe("curve");
  });

  it("writes steps that KaTeX renders", () => {
    rendersAll(en1993.bucklingReduction({ lambdaBar: 0.1, curve: "a0" }).steps);
    rendersAll(en1993.bucklingReduction({ lambdaBar: 1.7, curve: "d" }).steps);
  });
});

describe("en1993.tensionResistance", () => {
  it("takes the smaller of Npl,Rd and Nu,Rd", () => {
    // S235 without holes: 0.9 × 360 / 1.25 = 259 MPa on the net section beats 235 MPa on the gross.
    const yielding = en1993.tensionResistance({ A: 1000, fy: 235, Anet: 1000, fu: 360 });
    expect(yielding.governs).toBe("yielding");
    expect(yielding.NtRd).toBe(yielding.NplRd);
    const rupture = en1993.tensionResistance({ A: 1000, fy: 355, Anet: 700, fu: 490 });
    expect(rupture.governs).toBe("rupture");
    expect(rupture.NtRd).toBe(rupture.NuRd);
  });

  it("follows the partial factors given", () => {
    const base = en1993.tensionResistance({ A: 1000, fy: 355, Anet: 900, fu: 490 });
    const nad = en1993.tensionResistance({ A: 1000, fy: 355, Anet: 900, fu: 490, gammaM0: 1.1, gammaM2: 1.3 });
    expect(nad.NplRd).toBeCloseTo(base.NplRd / 1.1, 9);
    expect(nad.NuRd).toBeCloseTo((base.NuRd * 1.25) / 1.3, 9);
  });

  it("names the field for a net area above the gross area and a zero partial factor", () => {
    expect(invalidPath(() => en1993.tensionResistance({ A: 1000, fy: 355, Anet: 1100, fu: 490 }))).toBe("Anet");
    expect(invalidPath(() => en1993.tensionResistance({ A: 1000, fy: 355, Anet: 900, fu: 490, gammaM2: 0 }))).toBe("gammaM2");
  });

  it("writes steps that KaTeX renders", () => {
    rendersAll(en1993.tensionResistance({ A: 1000, fy: 355, Anet: 900, fu: 490 }).steps);
  });
});

describe("en1993.compressionResistance", () => {
  it("reaches the squash load A·fy/γM1 for a very short member", () => {
    const r = en1993.compressionResistance({ A: 1000, fy: 355, E: 210000, Lcr: 0, i: 20, curve: "b" });
    expect(r.lambdaBar).toBe(0);
    expect(r.NbRd).toBeCloseTo(1000 * 355, 9);
  });

  it("approaches χ → 1/λ̄² (the Euler load) for a very slender member", () => {
    const r = en1993.compressionResistance({ A: 1000, fy: 355, E: 210000, Lcr: 20000, i: 20, curve: "a0" });
    expect(r.chi * r.lambdaBar ** 2).toBeGreaterThan(0.9);
    expect(r.chi * r.lambdaBar ** 2).toBeLessThan(1);
  });

  it("rejects a zero radius of gyration", () => {
    expect(invalidPath(() => en1993.compressionResistance({ A: 1000, fy: 355, E: 210000, Lcr: 3000, i: 0, curve: "b" }))).toBe("i");
  });

  it("writes steps that KaTeX renders", () => {
    rendersAll(en1993.compressionResistance({ A: 1000, fy: 355, E: 210000, Lcr: 3000, i: 20, curve: "c" }).steps);
  });
});
