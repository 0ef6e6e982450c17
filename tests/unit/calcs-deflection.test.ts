import { describe, expect, it } from "vitest";
import { calcDefaults } from "@/lib/calcs/calc-defaults";
import type { DeflectionView } from "@/lib/calcs/deflection/deflection-view";
import type { TrussInputs } from "@/lib/calcs/truss/truss-inputs";
import type { TrussView } from "@/lib/calcs/truss/truss-view";
import { demoCalc, evaluateLast, seedCalc, valueOf } from "./calcs-fixtures";

const deflect = (inputs: Record<string, unknown>) => seedCalc("deflection", { truss: "T1", loadCase: "Q", joint: "L3", ...inputs }, "D9");

describe("Deflection calc", () => {
  it("checks a new calc's default, midspan of a new truss, against span/360", () => {
    const r = evaluateLast(seedCalc("truss", calcDefaults("truss")), seedCalc("deflection", calcDefaults("deflection")));
    expect(r.status).toBe("ok");
    expect(valueOf(r, "allowable")).toBeCloseTo(12000 / 360, 9);
  });

  it("finds the midspan deflection by virtual work, equal to the stiffness displacement", () => {
    const truss = evaluateLast(demoCalc("T1"));
    const r = evaluateLast(demoCalc("T1"), deflect({}));
    const view = r.view as DeflectionView;
    const stiffness = (truss.view as TrussView).cases.find((c) => c.id === "Q")?.displacements?.find((d) => d.joint === "L3")?.uy;
    expect(valueOf(r, "delta")).toBeCloseTo(stiffness ?? Number.NaN, 9);
    expect(view.agrees).toBe(true);
    expect(view.sense).toBe("downward");
    expect(view.terms.reduce((s, t) => s + t.contribution, 0)).toBeCloseTo(valueOf(r, "delta"), 9);
    // Span defaults to the truss's horizontal extent, 24 m; limit 24 000 mm / 360.
    expect(view.span).toBe(24);
    expect(valueOf(r, "allowable")).toBeCloseTo(24000 / 360, 9);
    expect(r.exports.delta).toMatchObject({ unit: "mm" });
    expect(view.pass).toBe(true);
  });

  it("takes the span the author gives", () => {
    const r = evaluateLast(demoCalc("T1"), deflect({ span: 20, limitRatio: 240 }));
    expect(valueOf(r, "allowable")).toBeCloseTo(20000 / 240, 9);
  });

  it("reports a joint the truss does not have on the joint field", () => {
    const r = evaluateLast(demoCalc("T1"), deflect({ joint: "M7" }));
    expect(r.fieldErrors).toEqual([{ path: "joint", message: expect.stringContaining("M7") }]);
  });

  it("explains that virtual work needs a section on every member of the truss", () => {
    const inputs = demoCalc("T1").inputs as TrussInputs;
    delete inputs.members[4].E;
    const r = evaluateLast(seedCalc("truss", inputs), deflect({}));
    expect(r.status).toBe("error");
    expect(r.fieldErrors).toEqual([]);
    expect(r.messages[0]).toContain(`Member ${inputs.members[4].id} needs a modulus of elasticity E`);
  });

  it("refuses a limit ratio that is not positive", () => {
    const r = evaluateLast(demoCalc("T1"), deflect({ limitRatio: 0 }));
    expect(r.fieldErrors[0].path).toBe("limitRatio");
  });
});
