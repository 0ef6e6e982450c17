import katex from "katex";
import { describe, expect, it } from "vitest";
import { deflection } from "@/lib/solve/deflection";
import type { TrussModel } from "@/lib/solve/types";
import { pratt4, prattWithCounter, triangle } from "./sections-trusses";
import { thrown } from "../support/solve-assertions";

const midspan = { loadCase: "D", joint: "L2", direction: "y" } as const;

describe("deflection", () => {
  it("returns one term per member whose contributions sum to the value", () => {
    const r = deflection(pratt4(), midspan);
    expect(r.terms).toHaveLength(13);
    for (const t of r.terms) expect(t.contribution).toBeCloseTo((t.N * t.n * t.L) / (t.A * t.E), 15);
    expect(r.value).toBeCloseTo(r.terms.reduce((s, t) => s + t.contribution, 0), 15);
    expect(r.value).toBeLessThan(0);
  });

  it("takes n from a unit load at the joint in the asked direction", () => {
    const r = deflection(pratt4(), midspan);
    // A unit upward load at L2 stretches nothing vertical: the hangers U1L1 and U3L3 carry no n.
    expect(r.terms.find((t) => t.member === "U1L1")?.n).toBeCloseTo(0, 12);
    expect(r.terms.find((t) => t.member === "U1U2")?.n).toBeCloseTo(0.75, 12);
  });

  it("agrees with the stiffness displacement, determinate or not", () => {
    for (const model of [pratt4(), prattWithCounter()]) {
      const r = deflection(model, midspan);
      expect(r.stiffnessValue).not.toBeNull();
      expect(r.agrees).toBe(true);
      expect(Math.abs(r.value - (r.stiffnessValue ?? 0))).toBeLessThan(1e-12);
    }
  });

  it("checks the deflection against span / ratio when both are given", () => {
    const pass = deflection(pratt4(), { ...midspan, limitRatio: 360, span: 12 });
    expect(pass.check).toEqual({ span: 12, ratio: 360, allowable: 12 / 360, pass: true, utilization: expect.closeTo(Math.abs(pass.value) / (12 / 360), 12) });
    const soft = pratt4();
    soft.members = soft.members.map((m) => ({ ...m, A: 1e-6 }));
    const fail = deflection(soft, { ...midspan, limitRatio: 240, span: 12 });
    expect(fail.check?.pass).toBe(false);
    expect(fail.steps.at(-1)?.latex).toContain("\\times");
    expect(deflection(pratt4(), midspan).check).toBeUndefined();
  });

  it("refuses a limit with a ratio but no span, or a span but no ratio", () => {
    expect(thrown(() => deflection(pratt4(), { ...midspan, limitRatio: 240 })).path).toBe("span");
    expect(thrown(() => deflection(pratt4(), { ...midspan, span: 12 })).path).toBe("limitRatio");
  });

  it("names the first member without A or E", () => {
    const noA = pratt4();
    noA.members[3] = { ...noA.members[3], A: undefined };
    const a = thrown(() => deflection(noA, midspan));
    expect([a.code, a.path]).toEqual(["INVALID", "members[3].A"]);
    expect(a.message).toContain(noA.members[3].id);
    const noE = pratt4();
    noE.members[5] = { ...noE.members[5], E: undefined };
    noE.members[7] = { ...noE.members[7], A: undefined };
    expect(thrown(() => deflection(noE, midspan)).path).toBe("members[5].E");
  });

  it("rejects an unknown joint and a direction other than x or y", () => {
    expect(thrown(() => deflection(pratt4(), { ...midspan, joint: "Q" })).path).toBe("joint");
    const bad = { ...midspan, direction: "z" } as unknown as Parameters<typeof deflection>[1];
    expect(thrown(() => deflection(pratt4(), bad)).path).toBe("direction");
  });

  it("is zero at a support in its restrained direction", () => {
    expect(deflection(pratt4(), { loadCase: "D", joint: "L4", direction: "y" }).value).toBeCloseTo(0, 15);
  });

  it("writes renderable steps with the model's units, including A and E units", () => {
    const model: TrussModel = {
      ...triangle(10),
      units: { length: "mm", force: "kN" },
      joints: triangle().joints.map((j) => ({ ...j, x: j.x * 1000, y: j.y * 1000 })),
    };
    model.members = model.members.map((m) => ({ ...m, A: 1000, E: 200 }));
    const r = deflection(model, { loadCase: "D", joint: "C", direction: "y" });
    for (const s of r.steps) expect(() => katex.renderToString(s.latex, { throwOnError: true })).not.toThrow();
    const table = r.steps.find((s) => s.latex.startsWith("\\begin{array}"))?.latex ?? "";
    expect(table).toContain("\\mathrm{mm^{2}}");
    expect(table).toContain("\\mathrm{kN/mm^{2}}");
    expect(r.steps.find((s) => s.latex.startsWith("\\delta_{y,\\mathrm{C}} = -"))?.latex).toMatch(/\\mathrm\{mm\}$/);
  });
});
