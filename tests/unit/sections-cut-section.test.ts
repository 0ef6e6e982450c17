import katex from "katex";
import { describe, expect, it } from "vitest";
import { cutSection } from "@/lib/solve/sections";
import type { TrussModel } from "@/lib/solve/types";
import { pratt4, prattWithCounter, trapezoid, triangle } from "./sections-trusses";
import { thrown } from "../support/solve-assertions";

const panel2 = { loadCase: "D", members: ["U1U2", "U1L2", "L1L2"], keep: "L0" };

describe("cutSection", () => {
  it("keeps the side that contains the `keep` joint", () => {
    expect(cutSection(pratt4(), panel2).keptJoints).toEqual(["L0", "L1", "U1"]);
    expect(cutSection(pratt4(), { ...panel2, keep: "U3" }).keptJoints).toEqual(["L2", "L3", "L4", "U2", "U3"]);
  });

  it("finds the same forces whichever side is kept", () => {
    const left = cutSection(pratt4(), panel2).forces;
    const right = cutSection(pratt4(), { ...panel2, keep: "L4" }).forces;
    for (const id of panel2.members) expect(right[id]).toBeCloseTo(left[id], 10);
  });

  it("lists the loads and the reaction on the free body", () => {
    const r = cutSection(pratt4(), panel2);
    expect(r.externalForces).toEqual([
      { joint: "L1", kind: "load", fx: 0, fy: -10 },
      { joint: "L0", kind: "reaction", fx: 0, fy: expect.closeTo(15, 9) },
    ]);
  });

  it("writes the moment equation term by term as force × perpendicular distance, counter-clockwise positive", () => {
    const r = cutSection(pratt4(), panel2);
    const eq = r.steps.find((s) => s.latex.startsWith("\\sum M_{\\mathrm{L2}}"));
    // The 10 kN load 3 m left of L2, pointing down, turns counter-clockwise; the 15 kN reaction 6 m left, pointing up, clockwise.
    expect(eq?.latex).toBe(
      "\\sum M_{\\mathrm{L2}} = 0:\\quad 10\\,\\mathrm{kN} \\times 3\\,\\mathrm{m} - 15\\,\\mathrm{kN} \\times 6\\,\\mathrm{m} - F_{\\mathrm{U1U2}} \\times 4\\,\\mathrm{m} = 0",
    );
    expect(r.steps.some((s) => /counter-clockwise positive/.test(s.text ?? ""))).toBe(true);
  });

  it("labels each result tension or compression", () => {
    const r = cutSection(pratt4(), panel2);
    const solved = (id: string) => r.steps.find((s) => s.latex.startsWith(`F_{\\mathrm{${id}}} = `))?.latex ?? "";
    expect(solved("U1U2")).toMatch(/-15\\,\\mathrm\{kN\}\\quad\\text\{\(compression\)\}$/);
    expect(solved("L1L2")).toMatch(/\(tension\)/);
  });

  it("says which joint a moment point is and on which side it lies", () => {
    const texts = cutSection(pratt4(), panel2).steps.map((s) => s.text ?? "");
    expect(texts.some((t) => t.startsWith("Moments about joint L2 (on the removed side)"))).toBe(true);
    expect(texts.some((t) => t.startsWith("Moments about joint U1 (on the free body)"))).toBe(true);
  });

  it("writes the shear equation across parallel chords as ΣFy", () => {
    const eq = cutSection(pratt4(), panel2).steps.find((s) => s.latex.startsWith("\\sum F_{y}"));
    expect(eq?.latex).toBe("\\sum F_{y} = 0:\\quad -10\\,\\mathrm{kN} + 15\\,\\mathrm{kN} - 0.8\\,F_{\\mathrm{U1L2}} = 0");
  });

  it("solves a two-member cut with moments about a point on the other member's line", () => {
    const r = cutSection(triangle(10), { loadCase: "D", members: ["AC", "BC"], keep: "C" });
    expect(r.keptJoints).toEqual(["C"]);
    // Moments about C would hold both unknowns, so each is found about the far end of the other member.
    expect(r.pivotKind).toEqual({ AC: { kind: "support", joint: "B" }, BC: { kind: "support", joint: "A" } });
    expect(r.forces.AC).toBeCloseTo(-6.25, 10);
    expect(r.forces.BC).toBeCloseTo(-6.25, 10);
    expect(r.agrees).toBe(true);
  });

  it("works on an internally indeterminate truss where the section itself is determinate", () => {
    // Panel 2 has two diagonals, but panel 3 is cut through three members with reactions from the full solution.
    const r = cutSection(prattWithCounter(), { loadCase: "D", members: ["U2U3", "U3L2", "L2L3"], keep: "L4" });
    expect(r.agrees).toBe(true);
    expect(r.forces.U3L2).toBeCloseTo(6.25, 9);
  });

  it("compares every cut member with the stiffness solution", () => {
    const r = cutSection(trapezoid(), { loadCase: "D", members: ["U0U1", "U0L1", "L0L1"], keep: "U0" });
    expect(Object.keys(r.comparison).sort()).toEqual(["L0L1", "U0L1", "U0U1"]);
    for (const c of Object.values(r.comparison)) {
      expect(c.agrees).toBe(true);
      expect(Math.abs(c.difference)).toBeLessThan(1e-9);
    }
    expect(r.steps.filter((s) => s.latex.includes("\\checkmark"))).toHaveLength(3);
  });

  it("writes every step so that KaTeX renders it, off-truss points included", () => {
    const r = cutSection(trapezoid(), { loadCase: "D", members: ["U0U1", "U0L1", "L0L1"], keep: "L0" });
    for (const s of r.steps) {
      expect(() => katex.renderToString(s.latex, { throwOnError: true })).not.toThrow();
      expect(s.text).toBeTruthy();
    }
  });

  it("carries the model's units on every quantity", () => {
    const model: TrussModel = { ...pratt4(), units: { length: "ft", force: "kip" } };
    const r = cutSection(model, panel2);
    const eq = r.steps.find((s) => s.latex.startsWith("\\sum M_{\\mathrm{L2}}"))?.latex ?? "";
    expect(eq).toContain("10\\,\\mathrm{kip} \\times 3\\,\\mathrm{ft}");
    expect(r.steps.some((s) => s.latex.includes("\\mathrm{kip\\cdot ft}"))).toBe(true);
    expect(r.steps.some((s) => s.latex.includes("kN"))).toBe(false);
  });

  it("returns finite numbers only", () => {
    const r = cutSection(pratt4(), panel2);
    for (const v of Object.values(r.forces)) expect(Number.isFinite(v)).toBe(true);
  });

  it("rejects a keep joint that is not in the truss, at path `keep`", () => {
    const e = thrown(() => cutSection(pratt4(), { ...panel2, keep: "X9" }));
    expect([e.code, e.path]).toEqual(["INVALID", "keep"]);
  });

  it("rejects an unknown or repeated member at its index in `members`", () => {
    const unknown = thrown(() => cutSection(pratt4(), { ...panel2, members: ["U1U2", "NOPE", "L1L2"] }));
    expect([unknown.code, unknown.path]).toEqual(["INVALID", "members[1]"]);
    const repeated = thrown(() => cutSection(pratt4(), { ...panel2, members: ["U1U2", "U1L2", "U1U2"] }));
    expect([repeated.code, repeated.path]).toEqual(["INVALID", "members[2]"]);
  });

  it("rejects a load case that is not in the model", () => {
    const e = thrown(() => cutSection(pratt4(), { ...panel2, loadCase: "W" }));
    expect([e.code, e.path]).toEqual(["INVALID", "loadCase"]);
  });
});
