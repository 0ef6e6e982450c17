import { describe, expect, it } from "vitest";
import { convertTrussUnits, solveTruss } from "@/lib/solve/truss";
import { benchPratt } from "@/lib/solve/truss/bench-pratt";
import { seedTriangle } from "./truss-fixtures";

describe("convertTrussUnits", () => {
  it("scales coordinates by length, loads by force, A by length² and E by force/length²", () => {
    const model = seedTriangle();
    model.members[0].A = 0.002;
    model.members[0].E = 2e8;
    const mm = convertTrussUnits(model, { length: "mm", force: "N" });
    expect(mm.units).toEqual({ length: "mm", force: "N" });
    expect(mm.joints[1].x).toBeCloseTo(4000, 9);
    expect(mm.loadCases[0].loads[0].fy).toBeCloseTo(-10000, 9);
    expect(mm.members[0].A).toBeCloseTo(2000, 9);
    expect(mm.members[0].E).toBeCloseTo(2e5, 6);
  });

  it("uses the exact foot, inch and pound-force (1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N)", () => {
    const model = seedTriangle();
    const us = convertTrussUnits(model, { length: "ft", force: "kip" });
    expect(us.joints[1].x).toBeCloseTo(4 / 0.3048, 12);
    expect(us.loadCases[0].loads[0].fy).toBeCloseTo(-10000 / 4448.2216152605, 12);
    expect(convertTrussUnits(model, { length: "in", force: "lbf" }).joints[2].y).toBeCloseTo(3 / 0.0254, 9);
  });

  it("keeps the model's own unit for a dimension not asked to change, and leaves absent A and E absent", () => {
    const out = convertTrussUnits(seedTriangle(), { force: "N" });
    expect(out.units).toEqual({ length: "m", force: "N" });
    expect(out.joints[1].x).toBe(4);
    expect("A" in out.members[0]).toBe(false);
  });

  it("round-trips to the same numbers", () => {
    const model = benchPratt({ panels: 3 });
    const back = convertTrussUnits(convertTrussUnits(model, { length: "in", force: "lbf" }), { length: "m", force: "kN" });
    back.joints.forEach((j, i) => expect(j.x).toBeCloseTo(model.joints[i].x, 12));
    back.members.forEach((m, i) => expect(m.E).toBeCloseTo(model.members[i].E ?? 0, 3));
  });

  it("gives the same truss: forces convert by the force factor and displacements by the length factor", () => {
    const model = benchPratt({ panels: 5 });
    const si = solveTruss(model).cases.LC1;
    const us = solveTruss(convertTrussUnits(model, { length: "ft", force: "kip" })).cases.LC1;
    const kip = 4.4482216152605;
    expect(us.forces.U1U2 * kip).toBeCloseTo(si.forces.U1U2, 9);
    expect((us.displacements?.L2.uy ?? 0) * 0.3048).toBeCloseTo(si.displacements?.L2.uy ?? 1, 12);
  });
});
