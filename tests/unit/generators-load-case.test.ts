import { describe, expect, it } from "vitest";
import { SolveError } from "@/lib/solve/errors";
import { addLoadCase, generateTruss, lineLoadToPanelLoads } from "@/lib/solve/generators";
import type { JointLoad, TrussModel } from "@/lib/solve/types";

function invalidPath(model: TrussModel, id: string, loads: JointLoad[]): string | undefined {
  try {
    addLoadCase(model, id, loads);
  } catch (e) {
    if (e instanceof SolveError && e.code === "INVALID") return e.path;
    throw e;
  }
  throw new Error("expected addLoadCase to reject the load case");
}

describe("addLoadCase", () => {
  const seed = () => generateTruss({ shape: "fink", span: 12, panels: 4, rise: 3 });

  it("appends a load case built from a line load and leaves the original model alone", () => {
    const { model, chords } = seed();
    const snow = lineLoadToPanelLoads({ model, chord: chords.top, w: 1.2 });
    const loaded = addLoadCase(model, "S", snow);
    expect(loaded.loadCases).toEqual([{ id: "S", loads: snow }]);
    expect(model.loadCases).toEqual([]);
    expect(loaded.joints).toEqual(model.joints);
  });

  it("keeps earlier load cases in order", () => {
    const { model } = seed();
    const both = addLoadCase(addLoadCase(model, "D", [{ joint: "U2", fy: -5 }]), "L", [{ joint: "L1", fy: -2 }]);
    expect(both.loadCases.map((c) => c.id)).toEqual(["D", "L"]);
  });

  it("rejects an id already used, an empty id, and a load on a joint the model lacks", () => {
    const { model } = seed();
    const withDead = addLoadCase(model, "D", []);
    expect(invalidPath(withDead, "D", [])).toBe("id");
    expect(invalidPath(model, " ", [])).toBe("id");
    expect(invalidPath(model, "W", [{ joint: "U1", fx: 1 }, { joint: "X9", fy: -1 }])).toBe("loads[1].joint");
    expect(invalidPath(model, "W", [{ joint: "U1", fy: Number.POSITIVE_INFINITY }])).toBe("loads[0].fy");
  });
});
