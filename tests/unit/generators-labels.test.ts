import { describe, expect, it } from "vitest";
import { generateTruss, type GenerateTrussOptions } from "@/lib/solve/generators";

// Each expectation is the trade's usual labelling for the shape, written out by hand
// (left joint first, upper joint first when plumb; bottom chord, top chord, webs).
const cases: { name: string; options: GenerateTrussOptions; joints: string; members: string; top: string; bottom: string }[] = [
  {
    name: "a 4-panel Pratt with vertical end posts has diagonals falling toward midspan",
    options: { shape: "pratt", span: 24, panels: 4, depth: 3 },
    joints: "L0 L1 L2 L3 L4 U0 U1 U2 U3 U4",
    members: "L0L1 L1L2 L2L3 L3L4 U0U1 U1U2 U2U3 U3U4 U0L0 U0L1 U1L1 U1L2 U2L2 L2U3 U3L3 L3U4 U4L4",
    top: "U0 U1 U2 U3 U4",
    bottom: "L0 L1 L2 L3 L4",
  },
  {
    name: "a 6-panel Pratt with inclined end posts starts its top chord at U1",
    options: { shape: "pratt", span: 24, panels: 6, depth: 3, ends: "inclined" },
    joints: "L0 L1 L2 L3 L4 L5 L6 U1 U2 U3 U4 U5",
    members: "L0L1 L1L2 L2L3 L3L4 L4L5 L5L6 U1U2 U2U3 U3U4 U4U5 L0U1 U1L1 U1L2 U2L2 U2L3 U3L3 L3U4 U4L4 L4U5 U5L5 U5L6",
    top: "U1 U2 U3 U4 U5",
    bottom: "L0 L1 L2 L3 L4 L5 L6",
  },
  {
    name: "a 4-panel Howe has diagonals rising toward midspan",
    options: { shape: "howe", span: 24, panels: 4, depth: 3 },
    joints: "L0 L1 L2 L3 L4 U0 U1 U2 U3 U4",
    members: "L0L1 L1L2 L2L3 L3L4 U0U1 U1U2 U2U3 U3U4 U0L0 L0U1 U1L1 L1U2 U2L2 U2L3 U3L3 U3L4 U4L4",
    top: "U0 U1 U2 U3 U4",
    bottom: "L0 L1 L2 L3 L4",
  },
  {
    name: "a 6-panel Warren numbers its zig-zag L0 U1 L2 … so the bottom chord has even numbers",
    options: { shape: "warren", span: 24, panels: 6, depth: 3 },
    joints: "L0 L2 L4 L6 U1 U3 U5",
    members: "L0L2 L2L4 L4L6 U1U3 U3U5 L0U1 U1L2 L2U3 U3L4 L4U5 U5L6",
    top: "U1 U3 U5",
    bottom: "L0 L2 L4 L6",
  },
  {
    name: "a 6-panel Warren with verticals keeps the zig-zag and adds UiLi at every interior panel point",
    options: { shape: "warren-verticals", span: 24, panels: 6, depth: 3 },
    joints: "L0 L1 L2 L3 L4 L5 L6 U1 U2 U3 U4 U5",
    members: "L0L1 L1L2 L2L3 L3L4 L4L5 L5L6 U1U2 U2U3 U3U4 U4U5 L0U1 U1L1 U1L2 U2L2 L2U3 U3L3 U3L4 U4L4 L4U5 U5L5 U5L6",
    top: "U1 U2 U3 U4 U5",
    bottom: "L0 L1 L2 L3 L4 L5 L6",
  },
  {
    name: "a 4-panel K truss splits every vertical but the midspan one at an M joint",
    options: { shape: "k", span: 24, panels: 4, depth: 3 },
    joints: "L0 L1 L2 L3 L4 U0 U1 U2 U3 U4 M0 M1 M3 M4",
    members:
      "L0L1 L1L2 L2L3 L3L4 U0U1 U1U2 U2U3 U3U4 U0M0 M0L0 M0U1 M0L1 U1M1 M1L1 M1U2 M1L2 U2L2 U2M3 L2M3 U3M3 M3L3 U3M4 L3M4 U4M4 M4L4",
    top: "U0 U1 U2 U3 U4",
    bottom: "L0 L1 L2 L3 L4",
  },
  {
    name: "a 6-panel pitched Pratt shares the heels L0 and L6 between the chords",
    options: { shape: "pratt-pitched", span: 24, panels: 6, rise: 4 },
    joints: "L0 L1 L2 L3 L4 L5 L6 U1 U2 U3 U4 U5",
    members: "L0L1 L1L2 L2L3 L3L4 L4L5 L5L6 L0U1 U1U2 U2U3 U3U4 U4U5 U5L6 U1L1 U1L2 U2L2 U2L3 U3L3 L3U4 U4L4 L4U5 U5L5",
    top: "L0 U1 U2 U3 U4 U5 L6",
    bottom: "L0 L1 L2 L3 L4 L5 L6",
  },
  {
    name: "a 6-panel pitched Howe mirrors the Pratt's diagonals",
    options: { shape: "howe-pitched", span: 24, panels: 6, rise: 4 },
    joints: "L0 L1 L2 L3 L4 L5 L6 U1 U2 U3 U4 U5",
    members: "L0L1 L1L2 L2L3 L3L4 L4L5 L5L6 L0U1 U1U2 U2U3 U3U4 U4U5 U5L6 U1L1 L1U2 U2L2 L2U3 U3L3 U3L4 U4L4 U4L5 U5L5",
    top: "L0 U1 U2 U3 U4 U5 L6",
    bottom: "L0 L1 L2 L3 L4 L5 L6",
  },
  {
    name: "a 4-panel scissors truss has webs from mid-rafter down to the bottom chord peak",
    options: { shape: "scissors", span: 24, panels: 4, rise: 4 },
    joints: "L0 L1 L2 L3 L4 U1 U2 U3",
    members: "L0L1 L1L2 L2L3 L3L4 L0U1 U1U2 U2U3 U3L4 U1L1 U1L2 U2L2 L2U3 U3L3",
    top: "L0 U1 U2 U3 L4",
    bottom: "L0 L1 L2 L3 L4",
  },
  {
    name: "a 4-panel Fink is the classic W with bottom joints at the third points",
    options: { shape: "fink", span: 12, panels: 4, rise: 3 },
    joints: "L0 L1 L2 L3 U1 U2 U3",
    members: "L0L1 L1L2 L2L3 L0U1 U1U2 U2U3 U3L3 U1L1 L1U2 U2L2 L2U3",
    top: "L0 U1 U2 U3 L3",
    bottom: "L0 L1 L2 L3",
  },
  {
    name: "a 6-panel fan spreads three webs from each third-point joint",
    options: { shape: "fan", span: 12, panels: 6, rise: 3 },
    joints: "L0 L1 L2 L3 U1 U2 U3 U4 U5",
    members: "L0L1 L1L2 L2L3 L0U1 U1U2 U2U3 U3U4 U4U5 U5L3 U1L1 U2L1 L1U3 U3L2 U4L2 L2U5",
    top: "L0 U1 U2 U3 U4 U5 L3",
    bottom: "L0 L1 L2 L3",
  },
  {
    name: "a 3-panel mono-pitch rises from the heel L0 to the end post U3L3",
    options: { shape: "mono-pitch", span: 9, panels: 3, rise: 3 },
    joints: "L0 L1 L2 L3 U1 U2 U3",
    members: "L0L1 L1L2 L2L3 L0U1 U1U2 U2U3 U1L1 U1L2 U2L2 U2L3 U3L3",
    top: "L0 U1 U2 U3",
    bottom: "L0 L1 L2 L3",
  },
];

describe("generateTruss labels", () => {
  it.each(cases)("$name", ({ options, joints, members, top, bottom }) => {
    const g = generateTruss(options);
    expect(g.model.joints.map((j) => j.id).join(" ")).toBe(joints);
    expect(g.model.members.map((m) => m.id).join(" ")).toBe(members);
    expect(g.chords.top.join(" ")).toBe(top);
    expect(g.chords.bottom.join(" ")).toBe(bottom);
  });

  it("gives parallel-chord the Pratt web with vertical end posts unless told otherwise", () => {
    const flat = generateTruss({ shape: "parallel-chord", span: 24, panels: 4, depth: 3 });
    expect(flat.model).toEqual(generateTruss({ shape: "pratt", span: 24, panels: 4, depth: 3 }).model);
    const howe = generateTruss({ shape: "parallel-chord", span: 24, panels: 6, depth: 3, web: "howe", ends: "inclined" });
    expect(howe.model).toEqual(generateTruss({ shape: "howe", span: 24, panels: 6, depth: 3, ends: "inclined" }).model);
    const k = generateTruss({ shape: "parallel-chord", span: 24, panels: 6, depth: 3, web: "k" });
    expect(k.model).toEqual(generateTruss({ shape: "k", span: 24, panels: 6, depth: 3 }).model);
  });

  it("loads the bottom chord of parallel-chord shapes and the top chord, heel to heel, of roof shapes", () => {
    const bridge = generateTruss({ shape: "warren", span: 24, panels: 6, depth: 3 });
    expect(bridge.loadedChord).toBe("bottom");
    expect(bridge.panelPoints).toEqual(["L0", "L2", "L4", "L6"]);
    const roof = generateTruss({ shape: "fink", span: 12, panels: 4, rise: 3 });
    expect(roof.loadedChord).toBe("top");
    expect(roof.panelPoints).toEqual(["L0", "U1", "U2", "U3", "L3"]);
  });
});

describe("generateTruss geometry", () => {
  it("puts the top chord of a parallel-chord truss at the given depth", () => {
    const { model } = generateTruss({ shape: "pratt", span: 24, panels: 4, depth: 3 });
    for (const j of model.joints) expect(j.y).toBe(j.id.startsWith("U") ? 3 : 0);
  });

  it("puts the K joints at mid-height", () => {
    const { model } = generateTruss({ shape: "k", span: 24, panels: 4, depth: 3 });
    for (const j of model.joints.filter((p) => p.id.startsWith("M"))) expect(j.y).toBe(1.5);
  });

  it("reaches the apex rise at midspan, and converts a pitch with the half span as run", () => {
    const byRise = generateTruss({ shape: "pratt-pitched", span: 12, panels: 6, rise: 3 }).model.joints.find((j) => j.id === "U3");
    expect(byRise).toEqual({ id: "U3", x: 6, y: 3 });
    // 6-in-12 pitch over a 6 m half span: 3 m rise.
    const byPitch = generateTruss({ shape: "pratt-pitched", span: 12, panels: 6, pitch: 0.5 }).model.joints.find((j) => j.id === "U1");
    expect(byPitch?.y).toBeCloseTo(1, 12);
  });

  it("converts a mono-pitch pitch with the whole span as run", () => {
    const { model } = generateTruss({ shape: "mono-pitch", span: 8, panels: 4, pitch: 0.25 });
    expect(model.joints.find((j) => j.id === "U4")).toEqual({ id: "U4", x: 8, y: 2 });
  });

  it("pitches a scissors bottom chord at half the top chord's unless given", () => {
    const half = generateTruss({ shape: "scissors", span: 24, panels: 4, rise: 4 }).model.joints.find((j) => j.id === "L2");
    expect(half?.y).toBe(2);
    const given = generateTruss({ shape: "scissors", span: 24, panels: 4, rise: 4, bottomPitch: 0.1 }).model.joints.find((j) => j.id === "L2");
    expect(given?.y).toBeCloseTo(1.2, 12);
  });

  it("places the Fink's interior bottom joints at equal bays of span / (panels − 1)", () => {
    const { model } = generateTruss({ shape: "fink", span: 12, panels: 4, rise: 3 });
    expect(model.joints.filter((j) => j.id.startsWith("L")).map((j) => j.x)).toEqual([0, 4, 8, 12]);
  });

  it("gives every member A and E when asked, and none otherwise, and records the units", () => {
    const withSection = generateTruss({ shape: "howe", span: 24, panels: 4, depth: 3, A: 0.004, E: 200e6, units: { length: "m", force: "kN" } });
    for (const m of withSection.model.members) expect(m).toMatchObject({ A: 0.004, E: 200e6 });
    expect(withSection.model.units).toEqual({ length: "m", force: "kN" });
    const bare = generateTruss({ shape: "howe", span: 24, panels: 4, depth: 3 });
    for (const m of bare.model.members) expect(Object.keys(m).sort()).toEqual(["end", "id", "start"]);
    expect(bare.model.units).toBeUndefined();
  });
});
