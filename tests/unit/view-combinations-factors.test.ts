import { describe, expect, it } from "vitest";
import { kindsCombined, readStandard, standardOptions, usesPsi0 } from "@/components/editor/nodes/combinations/combination-standards";
import { factorColumns, factorErrors, factorRows, factorSetsFromRows } from "@/components/editor/nodes/combinations/custom-factor-rows";
import { readCombinationsInputs } from "@/components/editor/nodes/combinations/read-combinations-inputs";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { demoCalc, demoCalcs, resultOf, seedCalc } from "./calcs-fixtures";

const cases = ["G", "Q", "name"];

describe("custom factor sets as table rows", () => {
  it("puts each case's factor in a column by position, so a case called 'name' cannot clash", () => {
    const cols = factorColumns(cases);
    expect(cols.map((c) => c.key)).toEqual(["name", "f0", "f1", "f2"]);
    expect(cols[3].label).toBe("γ name");
    const rows = factorRows([{ name: "ULS", factors: { G: 1.35, name: 0.5 } }], cases);
    expect(rows).toEqual([{ name: "ULS", f0: 1.35, f2: 0.5 }]);
  });

  it("goes back to sets with only the factors entered", () => {
    const sets = factorSetsFromRows([{ name: "SLS", f0: 1, f1: 1, f2: undefined }], cases);
    expect(sets).toEqual([{ name: "SLS", factors: { G: 1, Q: 1 } }]);
  });

  it("keeps the factors of a case the truss no longer has, so adding it back loses nothing", () => {
    const previous = [{ name: "ULS", factors: { G: 1.35, W: 1.5 } }];
    const sets = factorSetsFromRows([{ name: "ULS", f0: 1.2 }], ["G"], previous);
    expect(sets).toEqual([{ name: "ULS", factors: { W: 1.5, G: 1.2 } }]);
  });

  it("shows the calc's problems on the cell of the name or of the factor", () => {
    const errors = factorErrors(
      [
        { path: "custom[1].name", message: "is also a load case" },
        { path: "custom[0].factors.Q", message: "must be a finite number" },
        { path: "custom", message: "add at least one factor set" },
      ],
      cases,
    );
    expect(errors).toEqual({ "1.name": "is also a load case", "0.f1": "must be a finite number" });
  });

  it("round-trips through the calc: the custom set is applied to the truss", () => {
    const calcs = demoCalcs().filter((c) => c.label === "T1");
    const sets = factorSetsFromRows([{ name: "SLS characteristic", f0: 1, f1: 1 }], ["G", "Q"]);
    calcs.push(seedCalc("combinations", { truss: "T1", standard: "custom", custom: sets }, "C9"));
    const c9 = resultOf(evaluateCalcs({ calcs }), "C9");
    expect(c9.status).toBe("ok");
    expect((c9.view as { combinations: { name: string }[] }).combinations.map((c) => c.name)).toEqual(["SLS characteristic"]);
  });
});

describe("combination standards", () => {
  it("names each published set by edition and equation, then custom", () => {
    expect(standardOptions.map((o) => o.value)).toEqual(["ASCE7-16-LRFD", "ASCE7-22-LRFD", "ASCE7-16-ASD", "EN1990-6.10", "EN1990-6.10ab", "custom"]);
    expect(standardOptions[2].label).toContain("ASCE/SEI 7-16");
    expect(standardOptions[4].label).toContain("6.10a and 6.10b");
  });

  it("knows the kinds each family combines, and that ψ0 is Eurocode's", () => {
    expect(kindsCombined("ASCE7-22-LRFD")).toContain("Lr");
    expect(kindsCombined("EN1990-6.10")).toEqual(["G", "Q", "S", "W"]);
    expect(kindsCombined("custom")).toBeNull();
    expect(usesPsi0("EN1990-6.10ab")).toBe(true);
    expect(usesPsi0("ASCE7-16-ASD")).toBe(false);
  });

  it("reads stored inputs leniently: an unknown standard falls back to the default", () => {
    expect(readStandard("BS5950")).toBe("EN1990-6.10");
    expect(readCombinationsInputs({ truss: "T1", standard: "custom", custom: [{ name: "A", factors: { G: 1, Q: "x" } }], psi0: { Q: 0.5 } })).toEqual({
      truss: "T1",
      standard: "custom",
      custom: [{ name: "A", factors: { G: 1 } }],
      psi0: { Q: 0.5 },
    });
    expect(readCombinationsInputs(demoCalc("C1").inputs)).toEqual({ truss: "T1", standard: "EN1990-6.10" });
  });
});
