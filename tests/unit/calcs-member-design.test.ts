import { describe, expect, it } from "vitest";
import { calcDefaults } from "@/lib/calcs/calc-defaults";
import type { MemberDesignView } from "@/lib/calcs/member-design/member-design-view";
import { demoCalc, demoCalcs, evaluateLast, seedCalc, valueOf } from "./calcs-fixtures";

const withC1 = () => demoCalcs().filter((c) => ["T1", "C1"].includes(c.label));
const steelRow = { section: { shape: "rhs", b: 120, h: 120, t: 6.3 }, fy: 355, fu: 490, E: 210000, curve: "a" };
const design = (inputs: Record<string, unknown>) =>
  seedCalc("memberDesign", { truss: "T1", source: "C1", material: "steel-en1993", members: [{ member: "U2U3", ...steelRow }], ...inputs }, "M9");

/** EN 1993-1-1 §6.3.1.2 by hand: χ for a sharp-cornered SHS 120×120×6.3, curve a (α = 0.21), S355, L = 4 m. */
function handBucklingResistance(): number {
  const A = 120 ** 2 - (120 - 2 * 6.3) ** 2;
  const I = (120 ** 4 - (120 - 2 * 6.3) ** 4) / 12;
  const lambdaBar = 4000 / Math.sqrt(I / A) / (Math.PI * Math.sqrt(210000 / 355));
  const phi = 0.5 * (1 + 0.21 * (lambdaBar - 0.2) + lambdaBar ** 2);
  const chi = Math.min(1, 1 / (phi + Math.sqrt(phi ** 2 - lambdaBar ** 2)));
  return (chi * A * 355) / 1.0 / 1000;
}

describe("Member design calc", () => {
  it("checks a new calc's default member of a new truss", () => {
    const r = evaluateLast(seedCalc("truss", calcDefaults("truss")), seedCalc("memberDesign", calcDefaults("memberDesign")));
    expect(r.status).toBe("ok");
    expect(valueOf(r, "U_U1U2")).toBeGreaterThan(0);
    expect(valueOf(r, "U_max")).toBe(valueOf(r, "U_U1U2"));
  });

  it("checks the midspan top chord for its governing compression by EN 1993-1-1 §6.3.1", () => {
    const r = evaluateLast(...withC1(), design({}));
    const row = (r.view as MemberDesignView).rows[0];
    expect(row.mode).toBe("compression");
    expect(row.combination).toBe("(6.10) 1.35G + 1.5Q");
    expect(row.length).toBeCloseTo(4, 12);
    expect(row.capacity).toBeCloseTo(handBucklingResistance(), 6);
    expect(valueOf(r, "U_U2U3")).toBeCloseTo(322.2 / handBucklingResistance(), 6);
    expect(row.pass).toBe(true);
  });

  it("gives the demo's utilization table with the most utilized member as U_max", () => {
    const r = evaluateLast(...withC1(), demoCalc("M1"));
    expect(r.status).toBe("ok");
    const view = r.view as MemberDesignView;
    expect(view.rows.map((row) => row.member)).toEqual(["U1U2", "U2U3", "L1L2", "L2L3", "L0U1", "U1L2", "U2L3", "U1L1", "U2L2"]);
    expect(view.rows.every((row) => row.pass)).toBe(true);
    expect(view.governing?.member).toBe("U2U3");
    expect(valueOf(r, "U_max")).toBe(Math.max(...view.rows.map((row) => row.utilization)));
    // L2L3 in tension: 0.9 A fu / γM2 = 0.9 × 1900 × 490 / 1.25 = 670.3 kN governs over A fy = 674.5 kN.
    const bottom = view.rows.find((row) => row.member === "L2L3");
    expect(bottom?.mode).toBe("tension");
    expect(bottom?.capacity).toBeCloseTo((0.9 * 1900 * 490) / 1.25 / 1000, 6);
    expect(view.units).toEqual({ force: "kN", length: "m", design: { force: "N", length: "mm", stress: "MPa" } });
  });

  it("takes the forces of one load case when the source is a case of the truss", () => {
    const r = evaluateLast(demoCalc("T1"), design({ source: "Q" }));
    const row = (r.view as MemberDesignView).rows[0];
    expect(row.combination).toBe("Q");
    expect(row.force).toBeCloseTo(-150, 6);
  });

  it("reports a member that is not in the truss on its row", () => {
    const r = evaluateLast(...withC1(), design({ members: [{ member: "U7U8", ...steelRow }] }));
    expect(r.fieldErrors).toEqual([{ path: "members[0].member", message: "Member U7U8 is not in T1." }]);
  });

  it("reports a section whose walls are too thick on that dimension", () => {
    const r = evaluateLast(...withC1(), design({ members: [{ ...steelRow, member: "U2U3", section: { shape: "rhs", b: 120, h: 120, t: 70 } }] }));
    expect(r.status).toBe("error");
    expect(r.fieldErrors[0].path).toBe("members[0].section.t");
  });

  it("reports a missing steel strength on its row", () => {
    const { fy: _omitted, ...noFy } = steelRow;
    const r = evaluateLast(...withC1(), design({ members: [{ member: "U2U3", ...noFy }] }));
    expect(r.fieldErrors[0]).toEqual({ path: "members[0].fy", message: "is missing" });
  });

  it("says what a source may be when it names neither a calc nor a case", () => {
    const r = evaluateLast(demoCalc("T1"), design({ source: "C7" }));
    expect(r.fieldErrors).toEqual([{ path: "source", message: '"C7" is neither a Combinations calc in this package nor a load case of T1 (it has G, Q).' }]);
  });

  it("refuses a source that is a Truss calc rather than combinations", () => {
    const second = seedCalc("truss", demoCalc("T1").inputs, "T2");
    const r = evaluateLast(...withC1(), second, design({ source: "T2" }));
    expect(r.fieldErrors[0].path).toBe("source");
  });

  it("checks steel to AISC 360 in kip, in and ksi for a US truss", () => {
    const truss = seedCalc("truss", {
      units: { length: "ft", force: "kip" },
      joints: [
        { id: "A", x: 0, y: 0 },
        { id: "B", x: 8, y: 0 },
        { id: "C", x: 4, y: 6 },
      ],
      members: [
        { id: "AB", start: "A", end: "B" },
        { id: "BC", start: "B", end: "C" },
        { id: "CA", start: "C", end: "A" },
      ],
      supports: [
        { joint: "A", type: "pin" },
        { joint: "B", type: "roller" },
      ],
      loadCases: [{ id: "D", kind: "D", loads: [{ joint: "C", fy: -20 }] }],
    });
    const r = evaluateLast(
      truss,
      design({ source: "D", material: "steel-aisc360", members: [{ member: "AB", section: { shape: "properties", A: 2, rmin: 0.8 }, Fy: 50, Fu: 65, E: 29000 }] }),
    );
    expect(r.status).toBe("ok");
    const view = r.view as MemberDesignView;
    // AB in tension: 20 × (4/6) / 2 = 6.667 kip; φ Pn = 0.9 × 50 × 2 = 90 kip (yielding, gross section).
    expect(view.rows[0].force).toBeCloseTo(20 / 3, 9);
    expect(view.rows[0].capacity).toBeCloseTo(90, 9);
    expect(view.units.design).toEqual({ force: "kip", length: "in", stress: "ksi" });
  });
});
