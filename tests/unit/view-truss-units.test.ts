import { describe, expect, it } from "vitest";
import { convertDraftUnits } from "@/components/editor/nodes/truss/convert-draft-units";
import { readTrussDraft } from "@/components/editor/nodes/truss/truss-draft";
import { trussUnitText } from "@/components/editor/nodes/truss/truss-unit-text";
import { demoFootbridgeTruss } from "@/lib/document/demo-footbridge-truss";
import { evaluateLast, seedCalc, valueOf } from "./calcs-fixtures";

describe("trussUnitText", () => {
  it("follows lib/calcs: sections by the length unit, moduli by the force unit", () => {
    expect(trussUnitText({ length: "m", force: "kN" })).toEqual({ length: "m", force: "kN", area: "mm²", modulus: "GPa", lineLoad: "kN/m", moment: "kN·m" });
    expect(trussUnitText({ length: "ft", force: "kip" })).toMatchObject({ area: "in²", modulus: "ksi", lineLoad: "kip/ft" });
  });
});

describe("convertDraftUnits", () => {
  const si = readTrussDraft(demoFootbridgeTruss());

  it("converts every value so the structure is unchanged (1 ft = 0.3048 m, 1 kip = 4.4482216152605 kN; closed form)", () => {
    const us = convertDraftUnits(si, { length: "ft", force: "kip" });
    expect(us.units).toEqual({ length: "ft", force: "kip" });
    expect(us.joints[1].x).toBeCloseTo(4 / 0.3048, 9);
    expect(us.members[0].E).toBeCloseTo(210 * 145.0377377, 3);
    expect(us.members[0].A).toBeCloseTo((si.members[0].A ?? 0) / 645.16, 9);
    expect(us.lineLoads?.[1].w).toBeCloseTo((6.25 / 4.4482216152605) * 0.3048, 12);
    expect(us.generator?.span).toBeCloseTo(24 / 0.3048, 9);
  });

  it("gives the same member forces, in the new unit, when solved", () => {
    const us = convertDraftUnits(si, { length: "ft", force: "kip" });
    const inKn = valueOf(evaluateLast(seedCalc("truss", si)), "F_U2U3_Q");
    const inKip = valueOf(evaluateLast(seedCalc("truss", us)), "F_U2U3_Q");
    expect(inKip * 4.4482216152605).toBeCloseTo(inKn, 6);
  });

  it("comes back to the same numbers", () => {
    const back = convertDraftUnits(convertDraftUnits(si, { length: "ft", force: "kip" }), { length: "m", force: "kN" });
    expect(back.joints[3].x).toBeCloseTo(12, 12);
    expect(back.lineLoads?.[0].w).toBeCloseTo(3, 12);
  });
});
