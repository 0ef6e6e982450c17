import { describe, expect, it } from "vitest";
import { combineLoads } from "@/lib/solve/combinations";
import type { LoadAction, LoadStandard } from "@/lib/solve/combinations";

const gravity: LoadAction[] = [
  { id: "D", kind: "D", value: 10 },
  { id: "L", kind: "L", value: 6 },
  { id: "S", kind: "S", value: 8 },
];

describe("combineLoads: ASCE/SEI 7 sets", () => {
  it("evaluates each combination as the sum of factor times action value", () => {
    const r = combineLoads({ standard: "ASCE7-16-LRFD", actions: gravity });
    for (const c of r.combinations) {
      const sum = gravity.reduce((s, a) => s + c.factors[a.id] * a.value, 0);
      expect(c.value).toBeCloseTo(sum, 12);
    }
  });

  it("finds 1.2D + L + 1.6S as the maximum of a snow-dominated roof", () => {
    const r = combineLoads({ standard: "ASCE7-16-LRFD", actions: gravity });
    expect(r.max.name).toBe("(3) 1.2D + L + 1.6S");
    expect(r.max.value).toBeCloseTo(1.2 * 10 + 6 + 1.6 * 8, 12);
  });

  it("leaves a relieving live load out of the maximum and keeps only it in the minimum", () => {
    const actions: LoadAction[] = [
      { id: "D", kind: "D", value: 10 },
      { id: "L", kind: "L", value: -4 },
    ];
    const r = combineLoads({ standard: "ASCE7-16-LRFD", actions });
    const c2 = r.combinations.filter((c) => c.name.startsWith("(2)"));
    expect(c2.map((c) => c.factors)).toEqual([
      { D: 1.2, L: 0 },
      { D: 1.2, L: 1.6 },
    ]);
    expect(r.max.value).toBeCloseTo(14, 12); // 1.4D governs once L is left out
  });

  it("checks uplift with 0.9D + 1.0W when wind reverses the dead-load effect", () => {
    const r = combineLoads({
      standard: "ASCE7-16-LRFD",
      actions: [
        { id: "D", kind: "D", value: 5 },
        { id: "W", kind: "W", value: -12 },
      ],
    });
    expect(r.min.name).toBe("(5) 0.9D + W");
    expect(r.min.value).toBeCloseTo(0.9 * 5 - 12, 12);
  });

  it("takes two wind cases as alternatives, never both in one combination", () => {
    const r = combineLoads({
      standard: "ASCE7-16-ASD",
      actions: [
        { id: "D", kind: "D", value: 10 },
        { id: "WL", kind: "W", value: 7 },
        { id: "WR", kind: "W", value: 3 },
      ],
    });
    for (const c of r.combinations) expect(c.factors.WL !== 0 && c.factors.WR !== 0).toBe(false);
    expect(r.combinations.some((c) => c.factors.WR === 0.6)).toBe(true);
  });

  it("applies 0.75(0.6W) in ASD combination 6", () => {
    const r = combineLoads({
      standard: "ASCE7-16-ASD",
      actions: [
        { id: "D", kind: "D", value: 1 },
        { id: "L", kind: "L", value: 1 },
        { id: "W", kind: "W", value: 1 },
      ],
    });
    const six = r.combinations.find((c) => c.name.startsWith("(6)") && c.factors.W !== 0 && c.factors.L !== 0);
    expect(six?.factors.L).toBe(0.75);
    expect(six?.factors.W).toBeCloseTo(0.75 * 0.6, 12);
  });

  it("uses 1.0S as the principal snow load in ASCE 7-22 and 1.6S in ASCE 7-16", () => {
    const actions: LoadAction[] = [
      { id: "D", kind: "D", value: 1 },
      { id: "S", kind: "S", value: 1 },
    ];
    const principal = (standard: LoadStandard) =>
      Math.max(...combineLoads({ standard, actions }).combinations.map((c) => c.factors.S));
    expect(principal("ASCE7-22-LRFD")).toBe(1.0);
    expect(principal("ASCE7-16-LRFD")).toBe(1.6);
  });

  it("ignores psi0 for ASCE sets and says so", () => {
    const plain = combineLoads({ standard: "ASCE7-16-LRFD", actions: gravity });
    const withPsi = combineLoads({ standard: "ASCE7-16-LRFD", actions: gravity.map((a) => ({ ...a, psi0: 0.3 })) });
    expect(withPsi.combinations).toEqual(plain.combinations);
    expect(withPsi.steps.some((s) => s.latex.includes("psi0 is not used"))).toBe(true);
  });

  it("accepts a set with no dead load (a wind-only effect)", () => {
    const r = combineLoads({ standard: "ASCE7-16-LRFD", actions: [{ id: "W", kind: "W", value: -3 }] });
    expect(r.min.value).toBe(-3);
    expect(r.max.value).toBe(0);
  });
});

describe("combineLoads: EN 1990", () => {
  it("takes a relieving permanent action at gamma_G,inf = 1.0 in the minimum", () => {
    const r = combineLoads({
      standard: "EN1990-6.10",
      actions: [
        { id: "G", kind: "G", value: 10 },
        { id: "W", kind: "W", value: -20 },
      ],
    });
    expect(r.min.name).toBe("(6.10) G + 1.5W");
    expect(r.min.value).toBeCloseTo(10 - 30, 12);
  });

  it("uses an action's psi0 in place of the default of its kind", () => {
    const actions: LoadAction[] = [
      { id: "G", kind: "G", value: 0 },
      { id: "Q", kind: "Q", value: 1, psi0: 1.0 },
      { id: "W", kind: "W", value: 1 },
    ];
    const r = combineLoads({ standard: "EN1990-6.10", actions });
    const windLeading = r.combinations.find((c) => c.factors.W === 1.5 && c.factors.Q !== 0);
    expect(windLeading?.factors.Q).toBeCloseTo(1.5 * 1.0, 12);
  });

  it("gives 6.10a and 6.10b each at least once", () => {
    const r = combineLoads({ standard: "EN1990-6.10ab", actions: [{ id: "G", kind: "G", value: 1 }, { id: "Q", kind: "Q", value: 1 }] });
    expect(r.combinations.some((c) => c.name.startsWith("(6.10a)"))).toBe(true);
    expect(r.combinations.some((c) => c.name.startsWith("(6.10b)"))).toBe(true);
  });
});
