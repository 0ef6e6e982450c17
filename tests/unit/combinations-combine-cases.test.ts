import katex from "katex";
import { describe, expect, it } from "vitest";
import { combineCases, combineLoads } from "@/lib/solve/combinations";
import type { CustomFactorSet } from "@/lib/solve/combinations";
import { invalidPath } from "../support/solve-assertions";

// Member forces of a small roof truss per case (tension positive), invented.
const cases = [
  { id: "D", kind: "D" },
  { id: "S", kind: "S" },
  { id: "WL", kind: "W" },
  { id: "WR", kind: "W" },
];
const results = {
  D: { U1U2: -20, L1L2: 18, U1L2: 3 },
  S: { U1U2: -30, L1L2: 27, U1L2: 4.5 },
  WL: { U1U2: 25, L1L2: -22, U1L2: -9 },
  WR: { U1U2: 12, L1L2: -10, U1L2: 6 },
};

describe("combineCases with a published set", () => {
  it("gives per key the same extremes as combining that key's values alone", () => {
    const r = combineCases({ standard: "ASCE7-16-LRFD", cases, results, units: "kN" });
    for (const key of Object.keys(results.D)) {
      const single = combineLoads({
        standard: "ASCE7-16-LRFD",
        actions: cases.map((c) => ({ ...c, value: results[c.id as keyof typeof results][key as "U1U2"] })),
      });
      expect(r.envelope[key].max).toMatchObject(single.max);
      expect(r.envelope[key].min).toMatchObject(single.min);
    }
  });

  it("reports the governing factors, which reproduce the governing value", () => {
    const r = combineCases({ standard: "EN1990-6.10", cases: cases.map((c) => ({ ...c, kind: c.kind === "D" ? "G" : c.kind })), results });
    for (const [key, { max, min }] of Object.entries(r.envelope)) {
      for (const e of [max, min]) {
        const sum = cases.reduce((s, c) => s + e.factors[c.id] * results[c.id as keyof typeof results][key as "U1U2"], 0);
        expect(e.value).toBeCloseTo(sum, 12);
      }
    }
  });

  it("lists each combination at full factors with its superposed values", () => {
    const r = combineCases({ standard: "ASCE7-16-ASD", cases, results });
    const dPlusS = r.combinations.find((c) => c.name === "(3) D + S");
    expect(dPlusS?.values).toEqual({ U1U2: -50, L1L2: 45, U1L2: 7.5 });
  });
});

describe("combineCases with custom factor sets", () => {
  const factorSets: CustomFactorSet[] = [
    { name: "C1", factors: { D: 1.25, S: 1.5 } },
    { name: "C2", factors: { D: 0.9, WL: 1.4 } },
  ];

  it("applies the factors as entered, relieving cases included", () => {
    const r = combineCases({ factorSets, cases, results });
    expect(r.combinations.map((c) => c.name)).toEqual(["C1", "C2"]);
    expect(r.combinations[0].values.U1U2).toBeCloseTo(1.25 * -20 + 1.5 * -30, 12);
    expect(r.envelope.U1L2.min).toEqual({ value: 0.9 * 3 + 1.4 * -9, name: "C2", factors: { D: 0.9, S: 0, WL: 1.4, WR: 0 } });
    expect(r.envelope.U1L2.max.name).toBe("C1");
  });

  it("names the field of a factor on an unknown case or a repeated name", () => {
    expect(invalidPath(() => combineCases({ factorSets: [{ name: "X", factors: { Q: 1 } }], cases, results }))).toBe("factorSets[0].factors.Q");
    expect(invalidPath(() => combineCases({ factorSets: [factorSets[0], factorSets[0]], cases, results }))).toBe("factorSets[1].name");
  });
});

describe("combineCases input", () => {
  it("asks for exactly one of a standard and factor sets", () => {
    expect(invalidPath(() => combineCases({ cases, results } as never))).toBe("standard");
  });

  it("names a case without results and a key missing from one case", () => {
    expect(invalidPath(() => combineCases({ standard: "ASCE7-16-LRFD", cases: [...cases, { id: "L", kind: "L" }], results }))).toBe("results.L");
    const short = { ...results, WR: { U1U2: 12, L1L2: -10 } };
    expect(invalidPath(() => combineCases({ standard: "ASCE7-16-LRFD", cases, results: short }))).toBe("results.WR.U1L2");
  });

  it("names a non-finite result", () => {
    const bad = { ...results, S: { ...results.S, L1L2: Number.POSITIVE_INFINITY } };
    expect(invalidPath(() => combineCases({ standard: "ASCE7-16-LRFD", cases, results: bad }))).toBe("results.S.L1L2");
  });

  it("writes steps that KaTeX renders", () => {
    const r = combineCases({ standard: "ASCE7-22-LRFD", cases, results, units: "kN" });
    for (const s of r.steps) expect(() => katex.renderToString(s.latex, { throwOnError: true, strict: "error" }), s.latex).not.toThrow();
    expect(r.steps.filter((s) => s.latex.includes("\\max")).length).toBe(3);
  });
});
