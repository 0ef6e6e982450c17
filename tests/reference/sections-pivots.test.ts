/**
 * Where the moment point of a section lies: at a joint, at a support, off the
 * truss where two chords that are not parallel meet, or nowhere (parallel
 * chords: a force sum instead). Geometry is chosen so each expected value is
 * a short hand calculation.
 */
import { describe, expect, it } from "vitest";
import { cutSection } from "@/lib/solve/sections";
import type { Member, TrussModel } from "@/lib/solve/types";

const bar = (s: string, e: string): Member => ({ id: `${s}${e}`, start: s, end: e, A: 0.002, E: 2e8 });

/** Pitched truss with 2 m end verticals: top chord slope 1:2 from U0 (0,2) to apex U1 (4,4); 12 kN at U1, 6 kN at L1. */
const trapezoid: TrussModel = {
  joints: [
    { id: "L0", x: 0, y: 0 }, { id: "L1", x: 4, y: 0 }, { id: "L2", x: 8, y: 0 },
    { id: "U0", x: 0, y: 2 }, { id: "U1", x: 4, y: 4 }, { id: "U2", x: 8, y: 2 },
  ],
  members: [bar("L0", "L1"), bar("L1", "L2"), bar("U0", "U1"), bar("U1", "U2"), bar("L0", "U0"), bar("L2", "U2"), bar("U1", "L1"), bar("U0", "L1"), bar("U2", "L1")],
  supports: [{ joint: "L0", type: "pin" }, { joint: "L2", type: "roller" }],
  loadCases: [{ id: "D", loads: [{ joint: "U1", fy: -12 }, { joint: "L1", fy: -6 }] }],
};

/** Pitched Howe over 12 m, rise 3 m (top chord slope 1:2 through the heel L0); 10 kN at L1, L2, L3. */
const pitchedHowe: TrussModel = {
  joints: [
    ...[0, 1, 2, 3, 4].map((i) => ({ id: `L${i}`, x: 3 * i, y: 0 })),
    { id: "U1", x: 3, y: 1.5 }, { id: "U2", x: 6, y: 3 }, { id: "U3", x: 9, y: 1.5 },
  ],
  members: [
    bar("L0", "L1"), bar("L1", "L2"), bar("L2", "L3"), bar("L3", "L4"),
    bar("L0", "U1"), bar("U1", "U2"), bar("U2", "U3"), bar("U3", "L4"),
    bar("U1", "L1"), bar("U2", "L2"), bar("U3", "L3"), bar("L1", "U2"), bar("L3", "U2"),
  ],
  supports: [{ joint: "L0", type: "pin" }, { joint: "L4", type: "roller" }],
  loadCases: [{ id: "D", loads: [1, 2, 3].map((i) => ({ joint: `L${i}`, fy: -10 })) }],
};

describe("moment points of a section", () => {
  it("uses the point off the truss where the sloping top chord meets the bottom chord line", () => {
    const r = cutSection(trapezoid, { loadCase: "D", members: ["U0U1", "U0L1", "L0L1"], keep: "L0" });
    // closed form: line y = 2 + x/2 meets y = 0 at x = −4
    expect(r.pivots.U0L1?.x).toBeCloseTo(-4, 12);
    expect(r.pivots.U0L1?.y).toBeCloseTo(0, 12);
    expect(r.pivotKind.U0L1).toEqual({ kind: "off-truss point" });
    // closed form: R = (12 + 6)/2 = 9 kN; arm of U0L1 about (−4, 0) is 8/√5 m; F = 9·4/(8/√5) = 4.5√5 = 10.06 kN (tension)
    expect(r.forces.U0L1).toBeCloseTo(4.5 * Math.sqrt(5), 9);
    // common practice: a moment point off the truss is defined by its coordinates before it is used
    expect(r.steps.some((s) => s.latex.startsWith("P_{1} = "))).toBe(true);
    expect(r.steps.some((s) => s.latex.startsWith("\\sum M_{P_{1}} = 0"))).toBe(true);
  });

  it("uses joint U0 on the free body for the bottom chord of the end panel", () => {
    const r = cutSection(trapezoid, { loadCase: "D", members: ["U0U1", "U0L1", "L0L1"], keep: "L0" });
    expect(r.pivotKind.L0L1).toEqual({ kind: "joint", joint: "U0" }); // closed form: U0U1 and U0L1 meet at U0
    // closed form: the only other force on the free body, the reaction at L0, passes through U0, so L0L1 = 0
    expect(r.forces.L0L1).toBe(0);
    expect(r.pivotKind.U0U1).toEqual({ kind: "joint", joint: "L1" }); // closed form: U0L1 and L0L1 meet at L1
    // closed form: ΣM about L1 (4, 0): −9 kN·4 m − F·(8/√5 m) = 0 → U0U1 = −4.5√5 = −10.06 kN (compression)
    expect(r.forces.U0U1).toBeCloseTo(-4.5 * Math.sqrt(5), 9);
  });

  it("names the support where the top chord line passes through the heel", () => {
    const r = cutSection(pitchedHowe, { loadCase: "D", members: ["U1U2", "L1U2", "L1L2"], keep: "L0" });
    expect(r.pivotKind.L1U2).toEqual({ kind: "support", joint: "L0" }); // closed form: y = x/2 and y = 0 meet at the heel (0, 0)
    // closed form: ΣM about L0: −P·3 + F·(3 sin 45°) = 0 → F = P/sin 45° = 10√2 kN (tension)
    expect(r.forces.L1U2).toBeCloseTo(10 * Math.SQRT2, 9);
    expect(r.agrees).toBe(true); // closed form: determinate, so the stiffness solution matches
  });

  it("takes a force sum (null pivot) when the other two cut members are parallel chords", () => {
    const bar2 = (s: string, e: string): Member => ({ id: `${s}${e}`, start: s, end: e });
    // A one-panel cantilever 4 m long, 3 m deep, held at L0 (pin) and U0 (horizontal roller), 8 kN down at the tip L1.
    const square: TrussModel = {
      joints: [{ id: "L0", x: 0, y: 0 }, { id: "L1", x: 4, y: 0 }, { id: "U0", x: 0, y: 3 }, { id: "U1", x: 4, y: 3 }],
      members: [bar2("L0", "L1"), bar2("U0", "U1"), bar2("L0", "U0"), bar2("L1", "U1"), bar2("L0", "U1")],
      supports: [{ joint: "L0", type: "pin" }, { joint: "U0", type: "roller", direction: [1, 0] }],
      loadCases: [{ id: "D", loads: [{ joint: "L1", fy: -8 }] }],
    };
    const r = cutSection(square, { loadCase: "D", members: ["U0U1", "L0U1", "L0L1"], keep: "L1" });
    expect(r.pivots.L0U1).toBeNull(); // closed form: U0U1 and L0L1 are both horizontal
    expect(r.pivotKind.L0U1).toBeNull();
    // closed form: ΣFy on the tip (L1, U1): −8 kN + F·(−3/5) = 0, the diagonal pulling U1 towards L0 → F = −40/3 kN (compression)
    expect(r.forces.L0U1).toBeCloseTo(-40 / 3, 9);
    expect(r.steps.some((s) => s.latex.startsWith("\\sum F_{y} = 0"))).toBe(true); // common practice: shear across parallel chords by ΣFy
  });
});
