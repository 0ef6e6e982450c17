import { describe, expect, it } from "vitest";
import { calcDefaults } from "@/lib/calcs/calc-defaults";
import type { CombinationsView } from "@/lib/calcs/combinations/combinations-view";
import type { TrussInputs } from "@/lib/calcs/truss/truss-inputs";
import { demoCalc, evaluateLast, seedCalc, valueOf } from "./calcs-fixtures";

const combos = (inputs: Record<string, unknown>) => seedCalc("combinations", { truss: "T1", ...inputs }, "C9");

describe("Combinations calc", () => {
  it("combines a new Truss calc's case by EN 1990 Eq. 6.10 by default", () => {
    const r = evaluateLast(seedCalc("truss", calcDefaults("truss")), seedCalc("combinations", calcDefaults("combinations")));
    expect(r.status).toBe("ok");
    expect((r.view as CombinationsView).standard).toBe("EN1990-6.10");
  });

  it("finds the governing combination of each member force", () => {
    const r = evaluateLast(demoCalc("T1"), combos({ standard: "EN1990-6.10" }));
    // Set B, Eq. 6.10: 1.35 G + 1.5 Q for the most compression; G alone (γG,inf = 1.0, Q left out) for the least.
    expect(valueOf(r, "N_U2U3_min")).toBeCloseTo(1.35 * -72 + 1.5 * -150, 6);
    expect(valueOf(r, "N_U2U3_max")).toBeCloseTo(-72, 6);
    expect(valueOf(r, "R_L0_y_max")).toBeCloseTo(1.35 * 36 + 1.5 * 75, 6);
    const row = (r.view as CombinationsView).members.find((m) => m.member === "U2U3");
    expect(row?.min.combination).toBe("(6.10) 1.35G + 1.5Q");
    expect(row?.max.combination).toBe("(6.10) G");
  });

  it("exports the truss with every combination added as a case, for the calcs that read it", () => {
    const r = evaluateLast(demoCalc("T1"), combos({}));
    const value = r.exports.model;
    expect(value.type).toBe("truss");
    if (value.type !== "truss") return;
    expect(value.combinations).toContain("(6.10) 1.35G + 1.5Q");
    expect(value.model.loadCases.map((c) => c.id)).toEqual(expect.arrayContaining(["G", "Q", "(6.10) 1.35G + 1.5Q", "(6.10) G"]));
    expect(value.solution.cases["(6.10) 1.35G + 1.5Q"].forces.U2U3).toBeCloseTo(-322.2, 6);
    expect(value.envelope?.U2U3.min.value).toBeCloseTo(-322.2, 6);
    expect(value.source).toBe("T1");
  });

  it("applies custom factor sets as entered", () => {
    const r = evaluateLast(demoCalc("T1"), combos({ standard: "custom", custom: [{ name: "SLS", factors: { G: 1, Q: 1 } }] }));
    expect(valueOf(r, "N_U2U3_min")).toBeCloseTo(-222, 6);
    expect((r.view as CombinationsView).combinations.map((c) => c.name)).toEqual(["SLS"]);
  });

  it("reports a case kind the chosen standard does not combine on the standard field", () => {
    const r = evaluateLast(demoCalc("T1"), combos({ standard: "ASCE7-16-LRFD" }));
    expect(r.status).toBe("error");
    expect(r.fieldErrors[0].path).toBe("standard");
    expect(r.fieldErrors[0].message).toContain('Load case G of T1 is of kind "G"');
  });

  it("combines ASCE 7 kinds by ASCE 7-16 strength design", () => {
    const inputs = demoCalc("T1").inputs as TrussInputs;
    inputs.loadCases = [
      { id: "D", kind: "D", loads: [] },
      { id: "L", kind: "L", loads: [] },
    ];
    inputs.lineLoads = inputs.lineLoads?.map((l, i) => ({ ...l, case: i === 0 ? "D" : "L" }));
    const r = evaluateLast(seedCalc("truss", inputs), combos({ standard: "ASCE7-16-LRFD" }));
    expect(r.status).toBe("ok");
    // (2) 1.2D + 1.6L governs compression in the top chord.
    expect(valueOf(r, "N_U2U3_min")).toBeCloseTo(1.2 * -72 + 1.6 * -150, 6);
  });

  it("reports a custom factor on a case the truss does not have on that factor", () => {
    const r = evaluateLast(demoCalc("T1"), combos({ standard: "custom", custom: [{ name: "X", factors: { G: 1, W: 1 } }] }));
    expect(r.fieldErrors[0].path).toBe("custom[0].factors.W");
  });

  it("asks for factor sets when custom is chosen without any", () => {
    const r = evaluateLast(demoCalc("T1"), combos({ standard: "custom" }));
    expect(r.fieldErrors[0].path).toBe("custom");
  });

  it("refuses a custom combination named like a load case", () => {
    const r = evaluateLast(demoCalc("T1"), combos({ standard: "custom", custom: [{ name: "Q", factors: { Q: 1.5 } }] }));
    expect(r.fieldErrors[0].path).toBe("custom[0].name");
  });
});
