import { describe, expect, it } from "vitest";
import { combineLoads, psiFactors } from "@/lib/solve/combinations";
import type { LoadAction, LoadStandard } from "@/lib/solve/combinations";

/** Every factor set the standard produces for unit actions of the given kinds (all adding, so the maximum forms). */
function factorSets(standard: LoadStandard, kinds: string[]): Record<string, number>[] {
  const actions: LoadAction[] = kinds.map((k) => ({ id: k, kind: k, value: 1 }));
  return combineLoads({ standard, actions }).combinations.map((c) => c.factors);
}

function has(sets: Record<string, number>[], expected: Record<string, number>): boolean {
  return sets.some((s) => Object.keys(s).every((k) => Math.abs(s[k] - (expected[k] ?? 0)) < 1e-12));
}

describe("ASCE/SEI 7-16 §2.3.1 strength design", () => {
  const sets = factorSets("ASCE7-16-LRFD", ["D", "L", "Lr", "S", "R", "W"]);
  it.each([
    [{ D: 1.4 }], // Source: ASCE/SEI 7-16 §2.3.1 combination 1
    [{ D: 1.2, L: 1.6, Lr: 0.5 }], // Source: ASCE/SEI 7-16 §2.3.1 combination 2
    [{ D: 1.2, L: 1.6, S: 0.5 }], // Source: ASCE/SEI 7-16 §2.3.1 combination 2
    [{ D: 1.2, L: 1.6, R: 0.5 }], // Source: ASCE/SEI 7-16 §2.3.1 combination 2
    [{ D: 1.2, S: 1.6, L: 1.0 }], // Source: ASCE/SEI 7-16 §2.3.1 combination 3
    [{ D: 1.2, Lr: 1.6, W: 0.5 }], // Source: ASCE/SEI 7-16 §2.3.1 combination 3
    [{ D: 1.2, W: 1.0, L: 1.0, S: 0.5 }], // Source: ASCE/SEI 7-16 §2.3.1 combination 4
    [{ D: 0.9, W: 1.0 }], // Source: ASCE/SEI 7-16 §2.3.1 combination 5
  ])("includes %o", (expected) => {
    expect(has(sets, expected)).toBe(true);
  });

  it("never pairs two of Lr, S and R, nor 1.6L with full wind", () => {
    for (const s of sets) {
      expect([s.Lr, s.S, s.R].filter((f) => f > 0).length).toBeLessThanOrEqual(1);
      expect(s.L === 1.6 && s.W === 1.0).toBe(false);
    }
  });
});

describe("ASCE/SEI 7-22 §2.3.1 strength design (snow factors from memory)", () => {
  const sets = factorSets("ASCE7-22-LRFD", ["D", "L", "S", "W"]);
  it.each([
    [{ D: 1.2, S: 1.0, L: 1.0 }], // Source: ASCE/SEI 7-22 §2.3.1 combination 3, strength-level snow at 1.0 (STRUCTURE magazine, Feb. 2022)
    [{ D: 1.2, L: 1.6, S: 0.15 }], // Source: ASCE/SEI 7-22 §2.3.1 combination 2, 0.5(0.3S) (from memory)
    [{ D: 1.2, W: 1.0, L: 1.0, S: 0.15 }], // Source: ASCE/SEI 7-22 §2.3.1 combination 4, 0.5(0.3S) (from memory)
    [{ D: 0.9, W: 1.0 }], // Source: ASCE/SEI 7-22 §2.3.1 combination 5
  ])("includes %o", (expected) => {
    expect(has(sets, expected)).toBe(true);
  });
});

describe("ASCE/SEI 7-16 §2.4.1 allowable stress design", () => {
  const sets = factorSets("ASCE7-16-ASD", ["D", "L", "S", "W"]);
  it.each([
    [{ D: 1 }], // Source: ASCE/SEI 7-16 §2.4.1 combination 1
    [{ D: 1, L: 1 }], // Source: ASCE/SEI 7-16 §2.4.1 combination 2
    [{ D: 1, S: 1 }], // Source: ASCE/SEI 7-16 §2.4.1 combination 3
    [{ D: 1, L: 0.75, S: 0.75 }], // Source: ASCE/SEI 7-16 §2.4.1 combination 4
    [{ D: 1, W: 0.6 }], // Source: ASCE/SEI 7-16 §2.4.1 combination 5
    [{ D: 1, L: 0.75, W: 0.45, S: 0.75 }], // Source: ASCE/SEI 7-16 §2.4.1 combination 6, 0.75(0.6W)
    [{ D: 0.6, W: 0.6 }], // Source: ASCE/SEI 7-16 §2.4.1 combination 7
  ])("includes %o", (expected) => {
    expect(has(sets, expected)).toBe(true);
  });
});

describe("EN 1990 with set B factors", () => {
  const actions: LoadAction[] = [
    { id: "G", kind: "G", value: 10 },
    { id: "Q", kind: "Q", value: 5 },
  ];

  it("gives 1.35G + 1.5Q by Eq. 6.10", () => {
    expect(combineLoads({ standard: "EN1990-6.10", actions }).max.value).toBeCloseTo(1.35 * 10 + 1.5 * 5, 12); // Source: EN 1990:2002 Table A1.2(B), γG,sup = 1.35, γQ = 1.5
  });

  it("gives the less favourable of 6.10a and 6.10b", () => {
    const r = combineLoads({ standard: "EN1990-6.10ab", actions });
    expect(r.max.value).toBeCloseTo(0.85 * 1.35 * 10 + 1.5 * 5, 12); // Source: EN 1990:2002 Table A1.2(B), Eq. 6.10b with ξ = 0.85 (6.10a gives 1.35·10 + 1.5·0.7·5 = 18.75)
    expect(r.combinations.find((c) => c.name.startsWith("(6.10a)") && c.factors.Q !== 0)?.value).toBeCloseTo(18.75, 12); // Source: EN 1990:2002 Eq. 6.10a, ψ0 = 0.7 (Table A1.1, category A)
  });

  it("takes a favourable permanent action at 1.0", () => {
    const r = combineLoads({ standard: "EN1990-6.10", actions: [{ id: "G", kind: "G", value: 10 }, { id: "W", kind: "W", value: -20 }] });
    expect(r.min.value).toBeCloseTo(1.0 * 10 + 1.5 * -20, 12); // Source: EN 1990:2002 Table A1.2(B), γG,inf = 1.00
  });

  it("accompanies with γQ·ψ0: wind 0.6, snow at or below 1000 m 0.5", () => {
    const r = combineLoads({
      standard: "EN1990-6.10",
      actions: [
        { id: "S", kind: "S", value: 1 },
        { id: "W", kind: "W", value: 1 },
      ],
    });
    expect(r.combinations.some((c) => c.factors.S === 1.5 && Math.abs(c.factors.W - 1.5 * 0.6) < 1e-12)).toBe(true); // Source: EN 1990:2002 Table A1.1, wind ψ0 = 0.6
    expect(r.combinations.some((c) => c.factors.W === 1.5 && Math.abs(c.factors.S - 1.5 * 0.5) < 1e-12)).toBe(true); // Source: EN 1990:2002 Table A1.1, snow H ≤ 1000 m ψ0 = 0.5
  });
});

describe("psiFactors, EN 1990:2002 Table A1.1", () => {
  it.each([
    ["A", 0.7, 0.5, 0.3], // Source: EN 1990:2002 Table A1.1
    ["B", 0.7, 0.5, 0.3], // Source: EN 1990:2002 Table A1.1
    ["C", 0.7, 0.7, 0.6], // Source: EN 1990:2002 Table A1.1
    ["D", 0.7, 0.7, 0.6], // Source: EN 1990:2002 Table A1.1
    ["E", 1.0, 0.9, 0.8], // Source: EN 1990:2002 Table A1.1
    ["F", 0.7, 0.7, 0.6], // Source: EN 1990:2002 Table A1.1
    ["G", 0.7, 0.5, 0.3], // Source: EN 1990:2002 Table A1.1
    ["H", 0, 0, 0], // Source: EN 1990:2002 Table A1.1
    ["snow-nordic", 0.7, 0.5, 0.2], // Source: EN 1990:2002 Table A1.1
    ["snow-above-1000m", 0.7, 0.5, 0.2], // Source: EN 1990:2002 Table A1.1
    ["snow-up-to-1000m", 0.5, 0.2, 0], // Source: EN 1990:2002 Table A1.1
    ["wind", 0.6, 0.2, 0], // Source: EN 1990:2002 Table A1.1
    ["temperature", 0.6, 0.5, 0], // Source: EN 1990:2002 Table A1.1
  ] as const)("category %s has ψ0 %d, ψ1 %d, ψ2 %d", (category, psi0, psi1, psi2) => {
    expect(psiFactors[category]).toMatchObject({ psi0, psi1, psi2 });
  });
});
