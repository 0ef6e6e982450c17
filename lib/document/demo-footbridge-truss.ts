import { generateTruss, sectionProperties } from "../solve";
import type { TrussInputs } from "../calcs/truss/truss-inputs";

const shapes = {
  /** SHS 120×120×6.3: top chord and end posts. */
  topChord: { shape: "rhs" as const, b: 120, h: 120, t: 6.3 },
  /** RHS 120×80×5: bottom chord. */
  bottomChord: { shape: "rhs" as const, b: 120, h: 80, t: 5 },
  /** CHS 88.9×5: diagonals. */
  diagonal: { shape: "chs" as const, D: 88.9, t: 5 },
  /** CHS 76.1×4: verticals. */
  vertical: { shape: "chs" as const, D: 76.1, t: 4 },
};

/**
 * Sections of the demo footbridge truss (invented for the demo): hot-finished
 * S355 hollow sections, dimensions in mm, with the area T1 uses computed from
 * the same dimensions M1 checks, so the two can never disagree.
 */
export const demoSections = {
  topChord: { ...shapes.topChord, A: sectionProperties(shapes.topChord).A },
  bottomChord: { ...shapes.bottomChord, A: sectionProperties(shapes.bottomChord).A },
  diagonal: { ...shapes.diagonal, A: sectionProperties(shapes.diagonal).A },
  vertical: { ...shapes.vertical, A: sectionProperties(shapes.vertical).A },
};

/** Which section a member of the generated Pratt truss takes, by its end joints. */
function sectionOf(start: string, end: string): keyof typeof demoSections {
  const top = start.startsWith("U") && end.startsWith("U");
  const bottom = start.startsWith("L") && end.startsWith("L");
  if (top) return "topChord";
  if (bottom) return "bottomChord";
  const [a, b] = [start.slice(1), end.slice(1)];
  if (a === b) return "vertical";
  // The inclined end posts run from a support joint (L0, L6) to the top chord.
  if (start === "L0" || end === "L6") return "topChord";
  return "diagonal";
}

/**
 * T1 of the demo: a 24 m Pratt truss with inclined end posts, 6 panels of
 * 4 m, 3 m deep, generated once and stored as explicit joints and members.
 * Line loads per truss on the bottom chord (demo assumptions): G = 3.0 kN/m
 * (truss, cross-beams and deck), Q = 6.25 kN/m (5.0 kN/m² over a 1.25 m
 * tributary width).
 */
export function demoFootbridgeTruss(): TrussInputs {
  const { model, chords } = generateTruss({ shape: "pratt", span: 24, depth: 3, panels: 6, ends: "inclined" });
  return {
    units: { length: "m", force: "kN" },
    joints: model.joints.map((j) => ({ id: j.id, x: j.x, y: j.y })),
    members: model.members.map((m) => ({ id: m.id, start: m.start, end: m.end, A: demoSections[sectionOf(m.start, m.end)].A, E: 210 })),
    supports: model.supports.map((s) => ({ joint: s.joint, type: s.type })),
    loadCases: [
      { id: "G", kind: "G", loads: [] },
      { id: "Q", kind: "Q", loads: [] },
    ],
    lineLoads: [
      { case: "G", chord: chords.bottom, w: 3.0, projected: true },
      { case: "Q", chord: chords.bottom, w: 6.25, projected: true },
    ],
    generator: { shape: "pratt", span: 24, depth: 3, panels: 6, ends: "inclined" },
  };
}
