import katex from "katex";
import { describe, expect, it } from "vitest";
import { texQty } from "@/lib/solve/latex";
import { solveTruss } from "@/lib/solve/truss";
import { benchPratt } from "@/lib/solve/truss/bench-pratt";
import type { TrussModel, TrussSolution } from "@/lib/solve/types";
import { catchSolveError, seededRandom, seedStrip, seedTriangle } from "./truss-fixtures";

/** Σ(member forces on the joint) + loads + reaction, per joint and component; zero when the solution is in equilibrium. */
function jointResiduals(model: TrussModel, solution: TrussSolution, caseId: string): number[] {
  const result = solution.cases[caseId];
  const at = new Map(model.joints.map((j) => [j.id, { x: j.x, y: j.y, fx: 0, fy: 0 }]));
  for (const m of model.members) {
    const a = at.get(m.start);
    const b = at.get(m.end);
    if (!a || !b) throw new Error("bad fixture");
    const L = Math.hypot(b.x - a.x, b.y - a.y);
    const N = result.forces[m.id];
    a.fx += (N * (b.x - a.x)) / L;
    a.fy += (N * (b.y - a.y)) / L;
    b.fx -= (N * (b.x - a.x)) / L;
    b.fy -= (N * (b.y - a.y)) / L;
  }
  for (const load of model.loadCases.find((c) => c.id === caseId)?.loads ?? []) {
    const j = at.get(load.joint);
    if (j) { j.fx += load.fx ?? 0; j.fy += load.fy ?? 0; }
  }
  for (const [id, r] of Object.entries(result.reactions)) {
    const j = at.get(id);
    if (j) { j.fx += r.rx; j.fy += r.ry; }
  }
  return [...at.values()].flatMap((j) => [j.fx, j.fy]);
}

function render(latex: string): string {
  return katex.renderToString(latex, { throwOnError: true });
}

describe("solveTruss", () => {
  it("reports counts and classification with the results", () => {
    const solution = solveTruss(seedTriangle());
    expect(solution.counts).toEqual({ m: 3, r: 3, j: 3 });
    expect(solution.classification).toBe("determinate");
    expect(Object.keys(solution.cases)).toEqual(["D"]);
  });

  it("keeps every joint of a random truss in equilibrium, for every load case", () => {
    const random = seededRandom(11);
    for (let trial = 0; trial < 20; trial++) {
      const model = seedStrip(random, { triangles: 3 + trial, redundants: trial % 3, inclinedRoller: trial % 2 === 0, loadCases: 3 });
      const solution = solveTruss(model);
      for (const c of model.loadCases) {
        const scale = Math.max(...c.loads.map((l) => Math.hypot(l.fx ?? 0, l.fy ?? 0)));
        for (const r of jointResiduals(model, solution, c.id)) expect(Math.abs(r)).toBeLessThan(1e-9 * scale);
      }
    }
  });

  it("gives tension as positive: a bar hanging a load", () => {
    const model: TrussModel = {
      joints: [{ id: "top", x: 0, y: 2 }, { id: "mid", x: 0, y: 0 }, { id: "side", x: 2, y: 2 }],
      members: [{ id: "hanger", start: "top", end: "mid" }, { id: "tie", start: "side", end: "mid" }],
      supports: [{ joint: "top", type: "pin" }, { joint: "side", type: "pin" }],
      loadCases: [{ id: "D", loads: [{ joint: "mid", fy: -5 }] }],
    };
    const { forces } = solveTruss(model).cases.D;
    expect(forces.hanger).toBeCloseTo(5, 12);
    expect(forces.tie).toBe(0);
  });

  it("solves every load case, and a case with doubled loads gives doubled results", () => {
    const model = benchPratt({ panels: 6, loadCases: 2 });
    const { cases } = solveTruss(model);
    for (const [id, force] of Object.entries(cases.LC1.forces)) expect(cases.LC2.forces[id]).toBeCloseTo(2 * force, 9);
    for (const [id, d] of Object.entries(cases.LC1.displacements ?? {})) expect(cases.LC2.displacements?.[id].uy).toBeCloseTo(2 * d.uy, 12);
  });

  it("adds several loads on one joint", () => {
    const split = seedTriangle();
    split.loadCases[0].loads = [{ joint: "C", fy: -4 }, { joint: "C", fy: -6 }];
    expect(solveTruss(split).cases.D.forces).toEqual(solveTruss(seedTriangle()).cases.D.forces);
  });

  it("reports exactly zero, never round-off or −0, for a zero-force member", () => {
    const { forces } = solveTruss(benchPratt({ panels: 6 })).cases.LC1;
    expect(Object.is(forces.L0L1, 0)).toBe(true);
    expect(Object.is(forces.L5L6, 0)).toBe(true);
  });

  it("leaves displacements out of a determinate truss without A and E, whose forces need no stiffness", () => {
    const withSection = benchPratt({ panels: 6 });
    const without: TrussModel = { ...withSection, members: withSection.members.map(({ id, start, end }) => ({ id, start, end })) };
    const a = solveTruss(withSection).cases.LC1;
    const b = solveTruss(without).cases.LC1;
    expect(a.displacements).toBeDefined();
    expect(b.displacements).toBeUndefined();
    for (const id of Object.keys(a.forces)) expect(b.forces[id]).toBeCloseTo(a.forces[id], 9);
  });

  it("gives a determinate truss the same forces whatever its members' stiffness", () => {
    const random = seededRandom(5);
    const model = seedStrip(random, { triangles: 7 });
    const softer = { ...model, members: model.members.map((m, i) => ({ ...m, E: (m.E ?? 1) / (1 + i) })) };
    const a = solveTruss(model).cases.LC1;
    const b = solveTruss(softer).cases.LC1;
    for (const id of Object.keys(a.forces)) expect(b.forces[id]).toBeCloseTo(a.forces[id], 8);
    expect(b.displacements?.T0.uy).not.toBeCloseTo(a.displacements?.T0.uy ?? 0, 12);
  });

  it("asks for A and E on every member of an indeterminate truss, naming the first without", () => {
    const model = benchPratt({ panels: 4 });
    model.members.push({ id: "L0U1", start: "L0", end: "U1", A: 0.005, E: 2e8 });
    delete model.members[5].A;
    delete model.members[7].E;
    const error = catchSolveError(() => solveTruss(model));
    expect(error.code).toBe("INVALID");
    expect(error.path).toBe("members[5].A");
    expect(error.message).toMatch(/indeterminate/);
    model.members[5].A = 0.005;
    expect(catchSolveError(() => solveTruss(model)).path).toBe("members[7].E");
  });

  it("holds an inclined roller exactly: its reaction lies along its direction and the joint moves across it", () => {
    const model = seedStrip(seededRandom(3), { triangles: 6, inclinedRoller: true });
    const roller = model.supports[1];
    const [dx, dy] = roller.direction ?? [0, 1];
    const result = solveTruss(model).cases.LC1;
    const R = result.reactions[roller.joint];
    const u = result.displacements?.[roller.joint] ?? { ux: Number.NaN, uy: Number.NaN };
    expect(Math.abs(R.rx * dy - R.ry * dx)).toBeLessThan(1e-12 * Math.hypot(R.rx, R.ry));
    expect(Math.abs(u.ux * dx + u.uy * dy)).toBeLessThan(1e-12 * Math.hypot(u.ux, u.uy));
    expect(Math.hypot(u.ux, u.uy)).toBeGreaterThan(0);
  });

  it("answers a truss with no load cases with no cases and no steps", () => {
    const model = seedTriangle();
    model.loadCases = [];
    expect(solveTruss(model)).toMatchObject({ cases: {}, steps: [] });
  });

  describe("steps", () => {
    it("write ΣM about the pin, ΣFx and ΣFy for the first load case, each rendering in KaTeX", () => {
      const model = benchPratt({ panels: 4 });
      const { steps = [], cases } = solveTruss(model);
      expect(steps).toHaveLength(3);
      for (const step of steps) expect(() => render(step.latex)).not.toThrow();
      expect(steps[0].latex).toContain("\\sum M_{\\mathrm{L0}} = 0");
      expect(steps[0].latex).toContain("R_{\\mathrm{L4},y}\\,(12\\,\\mathrm{m})");
      expect(steps[0].latex).toContain("(-10\\,\\mathrm{kN})(3\\,\\mathrm{m})");
      expect(steps[0].latex.endsWith(`R_{\\mathrm{L4},y} = ${texQty(cases.LC1.reactions.L4.ry, "kN")}`)).toBe(true);
      expect(steps[1].latex).toContain("\\sum F_x = 0");
      expect(steps[2].latex.endsWith(`R_{\\mathrm{L0},y} = ${texQty(cases.LC1.reactions.L0.ry, "kN")}`)).toBe(true);
      expect(steps.every((s) => (s.text ?? "").length > 20)).toBe(true);
    });

    it("solve statics to the same reactions as the stiffness solution, inclined roller included", () => {
      const model = seedStrip(seededRandom(9), { triangles: 5, inclinedRoller: true });
      model.units = { length: "ft", force: "kip" };
      const { steps = [], cases } = solveTruss(model);
      const roller = cases.LC1.reactions[model.supports[1].joint];
      const pin = cases.LC1.reactions.B0;
      const [dx, dy] = model.supports[1].direction ?? [0, 1];
      const R = (roller.rx * dx + roller.ry * dy) / Math.hypot(dx, dy);
      const shown = (v: number) => String(Number(v.toPrecision(4)));
      expect(steps[0].text).toContain(`it is ${shown(R)} kip along`);
      expect(steps[1].text).toContain(`${shown(pin.rx)} kip`);
      expect(steps[2].text).toContain(`${shown(pin.ry)} kip`);
      expect(steps[0].latex).toContain("\\mathrm{ft}");
      for (const step of steps) expect(() => render(step.latex)).not.toThrow();
    });

    it("check the stiffness reactions when the supports are not one pin and one roller", () => {
      const model = seedStrip(seededRandom(4), { triangles: 4, secondPin: true });
      const { steps = [] } = solveTruss(model);
      expect(steps).toHaveLength(3);
      expect(steps[0].text).toMatch(/stiffness solution/);
      for (const step of steps) {
        expect(() => render(step.latex)).not.toThrow();
        expect(step.latex).toMatch(/= 0\\,\\mathrm\{kN(\\cdot m)?\}$/);
      }
    });

    it("show the loads as their total when there are many, and still render", () => {
      const { steps = [] } = solveTruss(benchPratt({ panels: 60 }));
      expect(steps[0].latex).toContain("\\underbrace");
      expect(steps[0].latex.length).toBeLessThan(600);
      for (const step of steps) expect(() => render(step.latex)).not.toThrow();
    });
  });
});
