import { z } from "zod";
import { generateTruss, lineLoadToPanelLoads, type TrussShape } from "../../solve";
import { trussForceUnits, trussLengthUnits } from "./truss-units";

/** Load-case kinds the published combination sets know (ASCE/SEI 7: D L Lr S R W; EN 1990: G Q S W); any other text is a custom kind. */
export const loadCaseKinds = ["D", "L", "Lr", "S", "R", "W", "G", "Q"] as const;

/** Shapes the generator can lay out; the record is kept for the editor's generator form. */
export const trussShapes = [
  "pratt", "howe", "warren", "warren-verticals", "k", "parallel-chord",
  "pratt-pitched", "howe-pitched", "scissors", "fink", "fan", "mono-pitch",
] as const satisfies readonly TrussShape[];

// Sizes beyond any truss an engineer would enter by hand, so one calc cannot stall a recompute.
const MAX_JOINTS = 5000;
const MAX_MEMBERS = 10000;
const MAX_CASES = 50;

const id = z.string().max(40);
const num = z.number();

const joint = z.strictObject({ id, x: num, y: num });
const member = z.strictObject({
  id,
  start: id,
  end: id,
  /** Area in mm² (SI) or in² (US). */
  A: num.optional(),
  /** Elastic modulus in GPa (SI) or ksi (US). */
  E: num.optional(),
});
const support = z.strictObject({ joint: id, type: z.enum(["pin", "roller"]), direction: z.tuple([num, num]).optional() });
const jointLoad = z.strictObject({ joint: id, fx: num.optional(), fy: num.optional() });
const loadCase = z.strictObject({
  id,
  /** D, L, Lr, S, R, W, G, Q, or a custom kind. */
  kind: z.string().min(1).max(24),
  loads: z.array(jointLoad).max(MAX_JOINTS * 2).default([]),
});
const lineLoad = z.strictObject({
  /** Id of the load case the panel loads are added to. */
  case: id,
  /** Joint ids along the chord, in order. */
  chord: z.array(id).min(2).max(MAX_JOINTS),
  /** Intensity in force per length, downward when positive. */
  w: num,
  /** true (default): per horizontal projection; false: per length along the chord. */
  projected: z.boolean().optional(),
});
const generator = z.strictObject({
  shape: z.enum(trussShapes),
  span: num,
  depth: num.optional(),
  rise: num.optional(),
  pitch: num.optional(),
  panels: z.number().int(),
  ends: z.enum(["vertical", "inclined"]).optional(),
});

/**
 * Inputs of a Truss calc. Lengths and loads in `units` (m and kN, or ft and
 * kip); member areas in mm² or in², moduli in GPa or ksi. Line loads are
 * lumped at the chord's panel points and added to their case.
 */
export const trussInputs = z.strictObject({
  units: z
    .strictObject({ length: z.enum(trussLengthUnits).default("m"), force: z.enum(trussForceUnits).default("kN") })
    .default({ length: "m", force: "kN" }),
  joints: z.array(joint).max(MAX_JOINTS),
  members: z.array(member).max(MAX_MEMBERS),
  supports: z.array(support).max(MAX_JOINTS),
  loadCases: z.array(loadCase).max(MAX_CASES),
  lineLoads: z.array(lineLoad).max(MAX_CASES * 4).optional(),
  /** How the geometry was generated, for the editor's generator form; the joints and members above are what is solved. */
  generator: generator.optional(),
});

/** Parsed inputs of a Truss calc. */
export type TrussInputs = z.infer<typeof trussInputs>;

/**
 * Where a new Truss calc starts: a 12 m Pratt truss, 4 panels, 2 m deep, every
 * member 2000 mm² and 210 GPa, with 5 kN/m of permanent load on the bottom chord.
 */
export function trussDefaults(): TrussInputs {
  const generated = generateTruss({ shape: "pratt", span: 12, depth: 2, panels: 4 });
  const { model, chords } = generated;
  // Checked once here so that the defaults can never drift from what the converter accepts.
  lineLoadToPanelLoads({ model, chord: chords.bottom, w: 5 });
  return {
    units: { length: "m", force: "kN" },
    joints: model.joints.map((j) => ({ id: j.id, x: j.x, y: j.y })),
    members: model.members.map((m) => ({ id: m.id, start: m.start, end: m.end, A: 2000, E: 210 })),
    supports: model.supports.map((s) => ({ joint: s.joint, type: s.type })),
    loadCases: [{ id: "G", kind: "G", loads: [] }],
    lineLoads: [{ case: "G", chord: chords.bottom, w: 5, projected: true }],
    generator: { shape: "pratt", span: 12, depth: 2, panels: 4 },
  };
}
