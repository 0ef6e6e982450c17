import { describe, expect, it } from "vitest";
import { applyGenerator } from "@/components/editor/nodes/truss/apply-generator";
import { generatorForm } from "@/components/editor/nodes/truss/generator-form";
import { readTrussDraft } from "@/components/editor/nodes/truss/truss-draft";
import { demoFootbridgeTruss } from "@/lib/document/demo-footbridge-truss";
import { evaluateLast, seedCalc } from "./calcs-fixtures";

const demo = () => readTrussDraft(demoFootbridgeTruss());

describe("generatorForm", () => {
  it("starts from how the truss was generated", () => {
    expect(generatorForm(demo())).toEqual({ shape: "pratt", span: 24, height: 3, panels: 6, ends: "inclined" });
  });

  it("shows the rise a pitch gives, since the form asks for a rise", () => {
    const draft = { ...demo(), generator: { shape: "fink" as const, span: 12, pitch: 0.25, panels: 4 } };
    expect(generatorForm(draft)).toMatchObject({ shape: "fink", height: 1.5 });
  });

  it("without a record, starts from the truss's extent", () => {
    const { generator: _, ...rest } = demo();
    expect(generatorForm(rest)).toMatchObject({ shape: "pratt", span: 24, height: 3 });
  });
});

describe("applyGenerator", () => {
  it("replaces the geometry, keeps the cases and moves line loads to the new deck chord", () => {
    const applied = applyGenerator(demo(), { shape: "warren", span: 20, height: 2.5, panels: 4, ends: "vertical" });
    if (!applied.ok) throw new Error(applied.message);
    const { draft } = applied;
    expect(applied.joints).toBe(draft.joints.length);
    expect(draft.members.every((m) => m.E === 210)).toBe(true);
    expect(draft.loadCases.map((c) => c.id)).toEqual(["G", "Q"]);
    expect(draft.lineLoads?.[0].chord[0]).toBe("L0");
    expect(draft.generator).toEqual({ shape: "warren", span: 20, panels: 4, depth: 2.5 });
    // What it writes must be what the runtime accepts and solves.
    const solved = evaluateLast(seedCalc("truss", draft));
    expect(solved.status).toBe("ok");
  });

  it("sets out pitched shapes by their rise", () => {
    const applied = applyGenerator(demo(), { shape: "fink", span: 12, height: 3, panels: 4, ends: "vertical" });
    expect(applied.ok && applied.draft.generator).toEqual({ shape: "fink", span: 12, panels: 4, rise: 3 });
  });

  it("puts a bad option on its field, in words", () => {
    expect(applyGenerator(demo(), { shape: "pratt", span: 24, height: 3, panels: 5, ends: "vertical" })).toEqual({ ok: false, field: "panels", message: "must be even for a symmetric shape" });
    expect(applyGenerator(demo(), { shape: "pratt", span: 24, height: -1, panels: 6, ends: "vertical" })).toMatchObject({ ok: false, field: "height" });
    expect(applyGenerator(demo(), { shape: "howe", span: 24, panels: 6, ends: "vertical" })).toEqual({ ok: false, field: "height", message: "Give the depth." });
  });
});
