import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { SolveError } from "@/lib/solve/errors";
import { generateTruss, lineLoadToPanelLoads, type LineLoadToPanelLoadsOptions } from "@/lib/solve/generators";
import type { JointLoad, TrussModel } from "@/lib/solve/types";
import { allCases, jointMap } from "./generators-cases";

const sum = (loads: JointLoad[], key: "fx" | "fy") => loads.reduce((s, l) => s + (l[key] ?? 0), 0);

/** Length of a chord: horizontal projection, or along its members. */
function chordLength(model: TrussModel, chord: string[], projected: boolean): number {
  const joints = jointMap(model);
  let length = 0;
  for (let i = 1; i < chord.length; i++) {
    const [a, b] = [joints.get(chord[i - 1])!, joints.get(chord[i])!];
    length += projected ? Math.abs(b.x - a.x) : Math.hypot(b.x - a.x, b.y - a.y);
  }
  return length;
}

function invalidPath(options: LineLoadToPanelLoadsOptions): string | undefined {
  try {
    lineLoadToPanelLoads(options);
  } catch (e) {
    if (e instanceof SolveError && e.code === "INVALID") return e.path;
    throw e;
  }
  throw new Error("expected lineLoadToPanelLoads to reject the options");
}

describe("lineLoadToPanelLoads", () => {
  const pratt = generateTruss({ shape: "pratt", span: 24, panels: 4, depth: 3 });

  it("gives the end panel points half a panel and interior ones a full panel", () => {
    const loads = lineLoadToPanelLoads({ model: pratt.model, chord: pratt.chords.bottom, w: 10 });
    // 6 m panels at 10 kN/m: 30 kN at the ends, 60 kN inside.
    expect(loads).toEqual([
      { joint: "L0", fy: -30 },
      { joint: "L1", fy: -60 },
      { joint: "L2", fy: -60 },
      { joint: "L3", fy: -60 },
      { joint: "L4", fy: -30 },
    ]);
  });

  it("splits unequal bays by half of each bay beside the joint", () => {
    // Fink bottom chord 12 m in 3 bays of 4 m.
    const fink = generateTruss({ shape: "fink", span: 12, panels: 4, rise: 3 });
    const loads = lineLoadToPanelLoads({ model: fink.model, chord: fink.chords.bottom, w: 1 });
    expect(loads.map((l) => l.fy)).toEqual([-2, -4, -4, -2]);
  });

  it("measures a sloped chord on plan by default (snow, roof live load)", () => {
    const roof = generateTruss({ shape: "pratt-pitched", span: 12, panels: 4, rise: 3 });
    const loads = lineLoadToPanelLoads({ model: roof.model, chord: roof.chords.top, w: 2 });
    expect(loads.map((l) => l.fy)).toEqual([-3, -6, -6, -6, -3]);
  });

  it("measures along the members when not projected (self-weight)", () => {
    // Panels 3 m on plan, rising 1.5 m each: sloped length √(3² + 1.5²).
    const roof = generateTruss({ shape: "pratt-pitched", span: 12, panels: 4, rise: 3 });
    const loads = lineLoadToPanelLoads({ model: roof.model, chord: roof.chords.top, w: 2, projected: false });
    const panel = Math.hypot(3, 1.5);
    const expected = [panel, 2 * panel, 2 * panel, 2 * panel, panel].map((t) => -t);
    loads.forEach((l, i) => expect(l.fy).toBeCloseTo(expected[i], 12));
  });

  it("reverses with a negative w (uplift) and leaves fx out when no direction is given", () => {
    const loads = lineLoadToPanelLoads({ model: pratt.model, chord: pratt.chords.top, w: -1 });
    expect(loads[1]).toEqual({ joint: "U1", fy: 6 });
  });

  it("acts along a given direction, normalised, e.g. wind normal to the left rafter", () => {
    const roof = generateTruss({ shape: "pratt-pitched", span: 12, panels: 4, rise: 3 });
    const leftRafter = ["L0", "U1", "U2"];
    // Rafter slopes 1:2; the inward normal is (1, −2)/√5 scaled here by 3 to prove normalisation.
    const loads = lineLoadToPanelLoads({ model: roof.model, chord: leftRafter, w: 1, projected: false, direction: [3, -6] });
    const rafter = Math.hypot(6, 3);
    expect(sum(loads, "fx")).toBeCloseTo(rafter / Math.sqrt(5), 12);
    expect(sum(loads, "fy")).toBeCloseTo((-2 * rafter) / Math.sqrt(5), 12);
    expect(loads[1].fx).toBeCloseTo((2 * loads[0].fx!), 12);
  });

  it.each(allCases())("adds up to w × chord length on both chords of a $name", ({ options }) => {
    const { model, chords } = generateTruss(options);
    // A 2-panel Warren's top chord is the single joint U1: no length to load.
    for (const chord of [chords.top, chords.bottom].filter((c) => c.length > 1)) {
      for (const projected of [true, false]) {
        const loads = lineLoadToPanelLoads({ model, chord, w: 1.7, projected });
        expect(loads.map((l) => l.joint)).toEqual(chord);
        expect(sum(loads, "fy")).toBeCloseTo(-1.7 * chordLength(model, chord, projected), 9);
      }
    }
  });

  it("adds up to w × span on the bottom chord for any span, panel count and intensity", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 500, noNaN: true }),
        fc.integer({ min: 1, max: 20 }).map((k) => 2 * k),
        fc.double({ min: -100, max: 100, noNaN: true }),
        (span, panels, w) => {
          const { model, chords } = generateTruss({ shape: "howe", span, panels, depth: span / 10 });
          const total = sum(lineLoadToPanelLoads({ model, chord: chords.bottom, w }), "fy");
          expect(total).toBeCloseTo(-w * span, 6);
        },
      ),
    );
  });

  it("never writes a signed zero", () => {
    const mono = generateTruss({ shape: "mono-pitch", span: 6, panels: 2, rise: 2 });
    // U2 to L2 is the vertical end post: no plan length, so L2 gets nothing from it.
    const loads = lineLoadToPanelLoads({ model: mono.model, chord: ["U2", "L2"], w: 5 });
    for (const l of loads) expect(Object.is(l.fy, -0)).toBe(false);
    expect(loads.map((l) => l.fy)).toEqual([0, 0]);
  });

  it("rejects a chord joint the model does not have, naming its place in the chord", () => {
    expect(invalidPath({ model: pratt.model, chord: ["L0", "L9"], w: 1 })).toBe("chord[1]");
  });

  it("rejects consecutive chord joints that no member joins", () => {
    expect(invalidPath({ model: pratt.model, chord: ["L0", "L2"], w: 1 })).toBe("chord[1]");
  });

  it("rejects a chord of fewer than two joints, a non-finite w and a zero direction", () => {
    expect(invalidPath({ model: pratt.model, chord: ["L0"], w: 1 })).toBe("chord");
    expect(invalidPath({ model: pratt.model, chord: ["L0", "L1"], w: Number.NaN })).toBe("w");
    expect(invalidPath({ model: pratt.model, chord: ["L0", "L1"], w: 1, direction: [0, 0] })).toBe("direction");
  });
});
