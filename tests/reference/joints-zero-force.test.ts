/**
 * Zero-force members by inspection. The two rules are the standard ones of
 * statics texts: at an unloaded, unsupported joint (1) two members not on one
 * line both carry zero; (2) of three members, two on one line, the third
 * carries zero.
 */
import { describe, expect, it } from "vitest";
import { zeroForceMembers } from "@/lib/solve/joints";
import { solveTruss } from "@/lib/solve/truss";
import type { Member, TrussModel } from "@/lib/solve/types";
import { pratt4 } from "@/tests/unit/sections-trusses";

const bar = (s: string, e: string): Member => ({ id: `${s}${e}`, start: s, end: e, A: 0.001, E: 2e8 });

/** Triangle A (0,0) pin, B (4,0) roller, C (2,2) loaded; D (0,2) hangs off A and C; E (−1,3) hangs off D and A. */
const appendages: TrussModel = {
  joints: [
    { id: "A", x: 0, y: 0 }, { id: "B", x: 4, y: 0 }, { id: "C", x: 2, y: 2 }, { id: "D", x: 0, y: 2 }, { id: "E", x: -1, y: 3 },
  ],
  members: [bar("A", "B"), bar("A", "C"), bar("B", "C"), bar("A", "D"), bar("C", "D"), bar("D", "E"), bar("E", "A")],
  supports: [{ joint: "A", type: "pin" }, { joint: "B", type: "roller" }],
  loadCases: [{ id: "D", loads: [{ joint: "C", fy: -10 }] }],
};

describe("zero-force members", () => {
  it("finds the midspan vertical of a Pratt under bottom-chord loads by rule 2 at U2", () => {
    // common practice: U1U2 and U2U3 are collinear at the unloaded joint U2, so U2L2 = 0
    expect(zeroForceMembers(pratt4(), { loadCase: "D" })).toEqual([
      expect.objectContaining({ member: "U2L2", rule: 2, joint: "U2" }),
    ]);
  });

  it("applies rule 1 again once earlier zero members are taken out", () => {
    const found = zeroForceMembers(appendages, { loadCase: "D" });
    // common practice: E has two non-collinear members (DE, EA): both zero; then D is left with AD and CD: both zero
    expect(found.map((f) => [f.member, f.rule, f.joint])).toEqual([
      ["DE", 1, "E"], ["EA", 1, "E"], ["AD", 1, "D"], ["CD", 1, "D"],
    ]);
    const forces = solveTruss(appendages).cases.D.forces;
    // closed form: the stiffness solution gives exactly these members zero force (to round-off)
    for (const f of found) expect(Math.abs(forces[f.member])).toBeLessThan(1e-9);
  });

  it("does not apply the rules at a loaded joint", () => {
    const model = pratt4();
    model.loadCases[0].loads.push({ joint: "U2", fy: -5 });
    // common practice: a load at U2 must be carried down U2L2
    expect(zeroForceMembers(model, { loadCase: "D" })).toEqual([]);
  });

  it("does not apply the rules at a supported joint", () => {
    const model = { ...appendages, supports: [...appendages.supports, { joint: "E", type: "roller" as const }] };
    // common practice: a reaction at E can balance DE and EA, so neither rule applies there (nor then at D)
    expect(zeroForceMembers(model, { loadCase: "D" }).map((f) => f.member)).not.toContain("DE");
  });

  it("says each rule in words naming the joint", () => {
    const [entry] = zeroForceMembers(pratt4(), { loadCase: "D" });
    expect(entry.description).toMatch(/Joint U2 is unloaded and unsupported with three members/);
    expect(entry.description).toMatch(/U1U2 and U2U3 are on one line/);
  });
});
