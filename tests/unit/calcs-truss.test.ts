import { describe, expect, it } from "vitest";
import { calcDefaults } from "@/lib/calcs/calc-defaults";
import type { TrussInputs } from "@/lib/calcs/truss/truss-inputs";
import type { TrussView } from "@/lib/calcs/truss/truss-view";
import { allNumbers, demoCalc, evaluateLast, seedCalc, valueOf } from "./calcs-fixtures";

function demoTruss(): TrussInputs {
  return demoCalc("T1").inputs as TrussInputs;
}

/** A(0,0) pin, B(4,0) roller, apex C(2,3), 10 kN down at C: bottom chord AB carries 10 × (2/3) / 2 = 3.333 tension. */
function triangle(units: TrussInputs["units"], A: number, E: number): TrussInputs {
  return {
    units,
    joints: [
      { id: "A", x: 0, y: 0 },
      { id: "B", x: 4, y: 0 },
      { id: "C", x: 2, y: 3 },
    ],
    members: [
      { id: "AB", start: "A", end: "B", A, E },
      { id: "BC", start: "B", end: "C", A, E },
      { id: "CA", start: "C", end: "A", A, E },
    ],
    supports: [
      { joint: "A", type: "pin" },
      { joint: "B", type: "roller" },
    ],
    loadCases: [{ id: "D", kind: "D", loads: [{ joint: "C", fy: -10 }] }],
  };
}

describe("Truss calc", () => {
  it("evaluates the inputs a new Truss calc starts from", () => {
    const r = evaluateLast(seedCalc("truss", calcDefaults("truss")));
    expect(r.status).toBe("ok");
    expect((r.view as TrussView).stability).toBe("Stable and statically determinate: m + r = 2j (17 + 3 = 2 × 10)");
  });

  it("states determinacy and stability in words with the count written out", () => {
    const view = evaluateLast(seedCalc("truss", demoTruss())).view as TrussView;
    expect(view.stability).toBe("Stable and statically determinate: m + r = 2j (21 + 3 = 2 × 12)");
    expect(view.classification).toBe("determinate");
    expect(view.counts).toEqual({ m: 21, r: 3, j: 12 });
  });

  it("exports member forces and reactions per case, matching statics by hand", () => {
    const r = evaluateLast(seedCalc("truss", demoTruss()));
    // G = 3 kN/m over 24 m: R = 36 kN; M at midspan = 3 × 24² / 8 = 216 kN·m over a 3 m depth.
    expect(valueOf(r, "R_L0_G_y")).toBeCloseTo(36, 9);
    expect(valueOf(r, "R_L6_Q_y")).toBeCloseTo(75, 9);
    expect(valueOf(r, "F_U2U3_G")).toBeCloseTo(-72, 9);
    expect(valueOf(r, "F_U2U3_Q")).toBeCloseTo(-150, 9);
    expect(r.exports.F_U2U3_G).toMatchObject({ unit: "kN" });
    const model = r.exports.model;
    expect(model.type).toBe("truss");
    if (model.type === "truss") {
      expect(model.cases).toEqual(["G", "Q"]);
      expect(model.caseKinds).toEqual({ G: "G", Q: "Q" });
      expect(model.source).toBe("T1");
    }
  });

  it("lumps a line load at the panel points by tributary length", () => {
    const view = evaluateLast(seedCalc("truss", demoTruss())).view as TrussView;
    const q = view.cases.find((c) => c.id === "Q");
    const total = (q?.loads ?? []).reduce((s, l) => s + l.fy, 0);
    expect(total).toBeCloseTo(-6.25 * 24, 9);
    expect(q?.loads.find((l) => l.joint === "L0")?.fy).toBeCloseTo(-6.25 * 2, 9);
    expect(q?.loads.find((l) => l.joint === "L3")?.fy).toBeCloseTo(-6.25 * 4, 9);
  });

  it("reads areas in mm² and moduli in GPa for an SI truss (δ = N L / A E by hand)", () => {
    const view = evaluateLast(seedCalc("truss", triangle({ length: "m", force: "kN" }, 1000, 200))).view as TrussView;
    const B = view.cases[0].displacements?.find((d) => d.joint === "B");
    // N = 10/3 kN, L = 4 m, A = 1000 mm² = 1e-3 m², E = 200 GPa = 2e8 kN/m² → 6.667e-5 m = 0.06667 mm.
    expect(B?.ux).toBeCloseTo(((10 / 3) * 4) / (1e-3 * 2e8) * 1000, 9);
    expect(view.units).toMatchObject({ length: "m", force: "kN", area: "mm^2", modulus: "GPa", displacement: "mm" });
  });

  it("reads areas in in² and moduli in ksi for a US truss, displacements in inches", () => {
    const r = evaluateLast(seedCalc("truss", triangle({ length: "ft", force: "kip" }, 1, 29000)));
    const view = r.view as TrussView;
    const B = view.cases[0].displacements?.find((d) => d.joint === "B");
    // N = 10/3 kip, L = 48 in, A = 1 in², E = 29000 ksi.
    expect(B?.ux).toBeCloseTo(((10 / 3) * 48) / (1 * 29000), 9);
    expect(view.units).toMatchObject({ length: "ft", force: "kip", area: "in^2", modulus: "ksi", displacement: "in" });
    expect(r.exports.F_AB_D).toMatchObject({ unit: "kip" });
  });

  it("reports a member ending at a joint that does not exist on that field", () => {
    const inputs = demoTruss();
    inputs.members[3].end = "X9";
    const r = evaluateLast(seedCalc("truss", inputs));
    expect(r.status).toBe("error");
    expect(r.fieldErrors).toHaveLength(1);
    expect(r.fieldErrors[0].path).toBe("members[3].end");
    expect(r.fieldErrors[0].message).toContain("X9");
    expect(r.exports).toEqual({});
  });

  it("reports inputs of the wrong shape on their own path", () => {
    const inputs = demoTruss() as unknown as { joints: { x: unknown }[]; members: Record<string, unknown>[] };
    inputs.joints[2].x = "3";
    inputs.members[0].colour = "red";
    const paths = evaluateLast(seedCalc("truss", inputs)).fieldErrors.map((e) => e.path);
    expect(paths).toContain("joints[2].x");
    expect(paths).toContain("members[0].colour");
  });

  it("reports a line load on a missing case, and a chord whose joints are not joined, under the line load", () => {
    const missing = demoTruss();
    missing.lineLoads = [{ case: "S", chord: ["L0", "L1"], w: 1 }];
    expect(evaluateLast(seedCalc("truss", missing)).fieldErrors[0].path).toBe("lineLoads[0].case");
    const apart = demoTruss();
    apart.lineLoads = [{ case: "G", chord: ["L0", "L2"], w: 1 }];
    expect(evaluateLast(seedCalc("truss", apart)).fieldErrors[0].path).toBe("lineLoads[0].chord[1]");
  });

  it("names the joints that can move when the truss is unstable", () => {
    const inputs = demoTruss();
    inputs.members = inputs.members.filter((m) => m.id !== "U1L2");
    const r = evaluateLast(seedCalc("truss", inputs));
    expect(r.status).toBe("error");
    expect(r.fieldErrors).toEqual([]);
    expect(r.messages[0]).toMatch(/unstable/i);
    expect(r.messages[0]).toMatch(/Joints that can move: .*U1/);
    expect((r.view as TrussView).stability).toMatch(/^Unstable: /);
    expect((r.view as TrussView).counts).toEqual({ m: 20, r: 3, j: 12 });
  });

  it("says so when the supports let the truss slide", () => {
    const inputs = demoTruss();
    inputs.supports = [
      { joint: "L0", type: "roller" },
      { joint: "L6", type: "roller" },
      { joint: "L3", type: "roller" },
    ];
    const r = evaluateLast(seedCalc("truss", inputs));
    expect(r.status).toBe("error");
    expect(r.messages[0]).toMatch(/slide/);
  });

  it("never exports or shows NaN or an infinite number", () => {
    const r = evaluateLast(seedCalc("truss", demoTruss()));
    expect(allNumbers(r.view).every(Number.isFinite)).toBe(true);
    expect(allNumbers(r.exports).every(Number.isFinite)).toBe(true);
  });
});
