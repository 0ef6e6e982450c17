import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { combineLoads } from "@/lib/solve/combinations";
import type { LoadAction, LoadStandard } from "@/lib/solve/combinations";
import { rendersAll, invalidPath } from "../support/solve-assertions";

const STANDARDS: LoadStandard[] = ["ASCE7-16-LRFD", "ASCE7-22-LRFD", "ASCE7-16-ASD", "EN1990-6.10", "EN1990-6.10ab"];

const gravity: LoadAction[] = [
  { id: "D", kind: "D", value: 10 },
  { id: "L", kind: "L", value: 6 },
  { id: "S", kind: "S", value: 8 },
];

describe("combineLoads: envelope properties", () => {
  const actionSet = fc
    .record({
      d: fc.double({ min: -50, max: 50, noNaN: true }),
      l: fc.double({ min: -50, max: 50, noNaN: true }),
      s: fc.double({ min: -50, max: 50, noNaN: true }),
      w1: fc.double({ min: -50, max: 50, noNaN: true }),
      w2: fc.double({ min: -50, max: 50, noNaN: true }),
    });
  const asActions = (v: { d: number; l: number; s: number; w1: number; w2: number }, en: boolean): LoadAction[] => [
    { id: "P", kind: en ? "G" : "D", value: v.d },
    { id: "V", kind: en ? "Q" : "L", value: v.l },
    { id: "S", kind: "S", value: v.s },
    { id: "W1", kind: "W", value: v.w1 },
    { id: "W2", kind: "W", value: v.w2 },
  ];

  it("brackets every combination between min and max, in every standard", () => {
    fc.assert(
      fc.property(actionSet, fc.constantFrom(...STANDARDS), (v, standard) => {
        const r = combineLoads({ standard, actions: asActions(v, standard.startsWith("EN")) });
        for (const c of r.combinations) {
          expect(c.value).toBeLessThanOrEqual(r.max.value);
          expect(c.value).toBeGreaterThanOrEqual(r.min.value);
          expect(Number.isFinite(c.value)).toBe(true);
        }
      }),
    );
  });

  it("finds a maximum no smaller than any combination with a relieving variable action taken out", () => {
    fc.assert(
      fc.property(actionSet, (v) => {
        const actions = asActions(v, false);
        const r = combineLoads({ standard: "ASCE7-16-LRFD", actions });
        for (const c of r.combinations) {
          for (const a of actions.filter((x) => x.kind !== "D" && x.value < 0 && c.factors[x.id] !== 0)) {
            expect(r.max.value).toBeGreaterThanOrEqual(c.value - c.factors[a.id] * a.value - 1e-9);
          }
        }
      }),
    );
  });

  it("makes 6.10a/b no more onerous than 6.10 on either side", () => {
    fc.assert(
      fc.property(actionSet, (v) => {
        const actions = asActions(v, true);
        const single = combineLoads({ standard: "EN1990-6.10", actions });
        const pair = combineLoads({ standard: "EN1990-6.10ab", actions });
        expect(pair.max.value).toBeLessThanOrEqual(single.max.value + 1e-9);
        expect(pair.min.value).toBeGreaterThanOrEqual(single.min.value - 1e-9);
      }),
    );
  });
});

describe("combineLoads: input and steps", () => {
  it("names the field of an unknown kind", () => {
    expect(invalidPath(() => combineLoads({ standard: "ASCE7-16-LRFD", actions: [{ id: "D", kind: "D", value: 1 }, { id: "X", kind: "G", value: 1 }] }))).toBe(
      "actions[1].kind",
    );
  });

  it("rejects repeated ids, non-finite values, psi0 above 1 and an empty list", () => {
    expect(invalidPath(() => combineLoads({ standard: "EN1990-6.10", actions: [{ id: "G", kind: "G", value: 1 }, { id: "G", kind: "Q", value: 1 }] }))).toBe(
      "actions[1].id",
    );
    expect(invalidPath(() => combineLoads({ standard: "EN1990-6.10", actions: [{ id: "G", kind: "G", value: Number.NaN }] }))).toBe("actions[0].value");
    expect(invalidPath(() => combineLoads({ standard: "EN1990-6.10", actions: [{ id: "Q", kind: "Q", value: 1, psi0: 1.2 }] }))).toBe("actions[0].psi0");
    expect(invalidPath(() => combineLoads({ standard: "EN1990-6.10", actions: [] }))).toBe("actions");
  });

  it("rejects an unknown standard", () => {
    expect(invalidPath(() => combineLoads({ standard: "BS5950" as LoadStandard, actions: gravity }))).toBe("standard");
  });

  it("writes steps that KaTeX renders, with the unit on every value", () => {
    for (const standard of STANDARDS) {
      const en = standard.startsWith("EN");
      const r = combineLoads({
        standard,
        units: "kN",
        actions: [
          { id: en ? "G" : "D", kind: en ? "G" : "D", value: 12.345678 },
          { id: "S", kind: "S", value: -3.2 },
          { id: "W_1", kind: "W", value: 4 },
          { id: "W_2", kind: "W", value: -4 },
        ],
      });
      rendersAll(r.steps);
      const lines = r.steps.filter((s) => s.latex.includes(" = ") && s.latex.startsWith("\\text{("));
      expect(lines.length).toBe(r.combinations.length);
      for (const s of lines) expect(s.latex).toContain("\\mathrm{kN}");
    }
  });
});
