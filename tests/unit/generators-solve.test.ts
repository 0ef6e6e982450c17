import { describe, expect, it } from "vitest";
import { addLoadCase, generateTruss, lineLoadToPanelLoads } from "@/lib/solve/generators";
import { countTruss, solveTruss, validateTruss } from "@/lib/solve/truss";
import { allCases } from "./generators-cases";

describe.each(allCases())("solveTruss on a generated $name", ({ options }) => {
  it("passes the model validation (references, zero-length and overlapping members)", () => {
    const { model } = generateTruss(options);
    expect(() => validateTruss(model)).not.toThrow();
  });

  it("counts as stable and statically determinate", () => {
    const { model } = generateTruss(options);
    const counts = countTruss(model);
    expect(counts.classification).toBe("determinate");
    expect(counts.m + counts.r).toBe(2 * counts.j);
  });

  it("solves a line load on its loaded chord, with reactions balancing the load", () => {
    const { model, panelPoints } = generateTruss(options);
    const loads = lineLoadToPanelLoads({ model, chord: panelPoints, w: 2 });
    const solution = solveTruss(addLoadCase(model, "D", loads));
    const total = loads.reduce((s, l) => s + (l.fy ?? 0), 0);
    const reactions = Object.values(solution.cases.D.reactions);
    expect(reactions.reduce((s, r) => s + r.ry, 0)).toBeCloseTo(-total, 6);
    expect(reactions.reduce((s, r) => s + r.rx, 0)).toBeCloseTo(0, 6);
    for (const force of Object.values(solution.cases.D.forces)) expect(Number.isFinite(force)).toBe(true);
  });
});
