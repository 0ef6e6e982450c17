import { describe, expect, it } from "vitest";
import { calcDefaults } from "@/lib/calcs/calc-defaults";
import { formulaLinePath } from "@/lib/calcs/formula/evaluate-formula";
import type { FormulaView } from "@/lib/calcs/formula/formula-view";
import { demoCalc, demoCalcs, evaluateLast, seedCalc, valueOf } from "./calcs-fixtures";

describe("Formula calc", () => {
  it("evaluates a new calc's example: M = w L² / 8", () => {
    const r = evaluateLast(seedCalc("formula", calcDefaults("formula")));
    expect(r.status).toBe("ok");
    expect(valueOf(r, "M")).toBeCloseTo((5 * 12 ** 2) / 8, 9);
    expect(r.exports.M).toMatchObject({ unit: "kN*m" });
    expect(r.steps).toHaveLength(3);
  });

  it("reads the section cut and the truss and gives the top-chord stress of the demo", () => {
    const r = evaluateLast(...demoCalcs().slice(0, 4), demoCalc("F1"));
    expect(r.status).toBe("ok");
    // N_Ed = 1.35 × (−72) + 1.5 × (−150) = −322.2 kN over 2865 mm².
    expect(valueOf(r, "N_Ed")).toBeCloseTo(-322.2, 6);
    expect(valueOf(r, "sigma_Ed")).toBeCloseTo((-322.2 * 1000) / 2865, 6);
    expect(r.exports.sigma_Ed).toMatchObject({ unit: "MPa" });
  });

  it("reports a line's problem on that line and still shows the others", () => {
    const r = evaluateLast(seedCalc("formula", { source: "a = 2 m\nb = a *\nc = a * 3" }));
    expect(r.status).toBe("error");
    expect(r.fieldErrors.map((e) => e.path)).toEqual([formulaLinePath(2)]);
    expect(formulaLinePath(2)).toBe("source:line2");
    const view = r.view as FormulaView;
    expect(view.lines.find((l) => l.name === "c")?.value).toBeCloseTo(6, 9);
    expect(view.lines.find((l) => l.line === 2)?.error).toBeTruthy();
  });

  it("shows results in US units when the calc prefers them", () => {
    const r = evaluateLast(seedCalc("formula", { source: "P = 10 kN", preferredUnits: "US" }));
    expect(r.exports.P).toMatchObject({ unit: "kip" });
    expect(valueOf(r, "P")).toBeCloseTo(10 / 4.4482216152605, 9);
  });

  it("refuses a source that is not text on the source field", () => {
    const r = evaluateLast(seedCalc("formula", { source: 42 }));
    expect(r.fieldErrors).toEqual([{ path: "source", message: "must be text" }]);
  });
});
