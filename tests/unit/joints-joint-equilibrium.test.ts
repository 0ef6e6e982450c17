import katex from "katex";
import { describe, expect, it } from "vitest";
import { jointEquilibrium } from "@/lib/solve/joints";
import type { TrussModel } from "@/lib/solve/types";
import { pratt4, trapezoid, triangle } from "./sections-trusses";
import { thrown } from "../support/solve-assertions";

describe("jointEquilibrium", () => {
  it("writes ΣFx and ΣFy with the unknowns assumed in tension and the reaction carried in", () => {
    const r = jointEquilibrium(pratt4(), { loadCase: "D", joint: "L0" });
    const latex = r.steps.map((s) => s.latex);
    expect(latex).toContain("\\sum F_{x} = 0:\\quad F_{\\mathrm{L0L1}} + 0.6\\,F_{\\mathrm{L0U1}} = 0");
    expect(latex).toContain("\\sum F_{y} = 0:\\quad 0.8\\,F_{\\mathrm{L0U1}} + 15\\,\\mathrm{kN}\\ (R_{y,\\mathrm{L0}}) = 0");
    expect(r.steps[0].text).toMatch(/assumed in tension/);
  });

  it("solves the equation with one unknown first, then substitutes", () => {
    const r = jointEquilibrium(pratt4(), { loadCase: "D", joint: "L0" });
    const texts = r.steps.map((s) => s.text ?? "");
    const first = texts.findIndex((t) => t.startsWith("From ΣFy: L0U1 = -18.75 kN, compression"));
    const second = texts.findIndex((t) => t.startsWith("From ΣFx with L0U1 substituted: L0L1 = 11.25 kN, tension"));
    expect(first).toBeGreaterThan(0);
    expect(second).toBeGreaterThan(first);
  });

  it("solves the two equations together when both unknowns appear in both", () => {
    // At U0 of the pitched truss both unknowns (U0U1 and U0L1) slope, so neither equation has one unknown alone.
    const r = jointEquilibrium(trapezoid(), { loadCase: "D", joint: "U0", known: { L0U0: -9 } });
    expect(r.forces.U0U1).toBeCloseTo(-4.5 * Math.sqrt(5), 10);
    expect(r.forces.U0L1).toBeCloseTo(4.5 * Math.sqrt(5), 10);
    expect(r.steps.filter((s) => /Solving ΣFx and ΣFy together/.test(s.text ?? ""))).toHaveLength(2);
  });

  it("carries known member forces in and ignores those of members elsewhere", () => {
    const r = jointEquilibrium(pratt4(), { loadCase: "D", joint: "L1", known: { L0L1: 11.25, U1U2: -15 } });
    expect(r.unknowns).toEqual(["L1L2", "U1L1"]);
    expect(r.forces.L1L2).toBeCloseTo(11.25, 10);
    expect(r.forces.U1L1).toBeCloseTo(10, 10);
    expect(r.steps[0].text).toMatch(/known L0L1 = 11.25 kN carried in/);
  });

  it("uses the spare equation as a check when only one force is unknown", () => {
    const ok = jointEquilibrium(pratt4(), { loadCase: "D", joint: "L1", known: { L0L1: 11.25, L1L2: 11.25 } });
    expect(ok.forces.U1L1).toBeCloseTo(10, 10);
    expect(ok.balanced).toBe(true);
    expect(ok.steps.map((s) => s.latex)).toContain("\\sum F_{x} = 0\\,\\mathrm{kN}\\ \\approx 0\\ \\checkmark");
    const bad = jointEquilibrium(pratt4(), { loadCase: "D", joint: "L1", known: { L0L1: 11.25, L1L2: 12 } });
    expect(bad.balanced).toBe(false);
    expect(bad.agrees).toBe(false);
    expect(bad.steps.some((s) => s.latex.includes("\\neq 0"))).toBe(true);
  });

  it("refuses a joint with more than two unknowns, naming them", () => {
    const e = thrown(() => jointEquilibrium(pratt4(), { loadCase: "D", joint: "U1" }));
    expect(e.code).toBe("UNSOLVABLE_CUT");
    expect(e.message).toMatch(/4 unknown member forces \(U1U2, L0U1, U1L1, U1L2\)/);
  });

  it("refuses two unknowns on one line, saying why", () => {
    const e = thrown(() => jointEquilibrium(pratt4(), { loadCase: "D", joint: "U2", known: { U2L2: 0 } }));
    expect(e.code).toBe("UNSOLVABLE_CUT");
    expect(e.message).toMatch(/U1U2 and U2U3 lie on one line/);
  });

  it("rejects an unknown joint and an unknown known-member with their paths", () => {
    const j = thrown(() => jointEquilibrium(pratt4(), { loadCase: "D", joint: "Z" }));
    expect([j.code, j.path]).toEqual(["INVALID", "joint"]);
    const k = thrown(() => jointEquilibrium(pratt4(), { loadCase: "D", joint: "L0", known: { Q: 1 } }));
    expect([k.code, k.path]).toEqual(["INVALID", "known.Q"]);
  });

  it("renders every step and carries the model's units", () => {
    const model: TrussModel = { ...triangle(10), units: { length: "in", force: "kip" } };
    const r = jointEquilibrium(model, { loadCase: "D", joint: "C" });
    for (const s of r.steps) expect(() => katex.renderToString(s.latex, { throwOnError: true })).not.toThrow();
    expect(r.steps.some((s) => s.latex.includes("10\\,\\mathrm{kip}"))).toBe(true);
    expect(r.forces.AC).toBeCloseTo(-6.25, 10);
  });
});
