import type { SelectOption } from "@/components/editor/input-table/input-column";

/** The section shapes a member row may use; "properties" enters A and r directly. */
export const sectionShapes = ["angle", "double-angle", "channel", "chs", "rhs", "round", "rectangle", "timber", "properties"] as const;
export type SectionShapeName = (typeof sectionShapes)[number];

/** One dimension or property of a shape; `area` ones are in length², the rest in length. */
export type SectionField = { key: string; label: string; name: string; area?: boolean; optional?: boolean; blankMeans?: string };

const NAMES: Record<SectionShapeName, string> = {
  angle: "Angle",
  "double-angle": "Double angle",
  channel: "Channel",
  chs: "Circular hollow (CHS, pipe)",
  rhs: "Rectangular hollow (RHS, SHS)",
  round: "Solid round bar",
  rectangle: "Solid rectangle (flat bar)",
  timber: "Sawn lumber or glulam",
  properties: "By properties (A, r)",
};

const FIELDS: Record<SectionShapeName, SectionField[]> = {
  angle: [dim("d", "leg d"), dim("b", "leg b"), dim("t", "thickness t")],
  "double-angle": [dim("d", "leg d (back to back)"), dim("b", "leg b"), dim("t", "thickness t"), dim("gap", "gap (gusset)")],
  channel: [dim("d", "depth d"), dim("bf", "flange width bf"), dim("tf", "flange thickness tf"), dim("tw", "web thickness tw")],
  chs: [dim("D", "outside diameter D"), dim("t", "wall t")],
  rhs: [dim("b", "width b"), dim("h", "height h"), dim("t", "wall t"), { ...dim("cornerRadius", "outside corner radius"), optional: true, blankMeans: "sharp corners" }],
  round: [dim("D", "diameter D")],
  rectangle: [dim("b", "width b"), dim("h", "thickness h")],
  timber: [dim("b", "breadth b"), dim("d", "depth d")],
  properties: [{ key: "A", label: "A", name: "area A", area: true }, dim("rmin", "least radius of gyration r"), { ...dim("d", "least dimension d"), optional: true, blankMeans: "none; timber needs it" }],
};

/** Starting dimensions per shape: common sizes, in mm for SI trusses and in for US ones. */
const DEFAULTS: Record<"mm" | "in", Record<SectionShapeName, Record<string, number>>> = {
  mm: {
    angle: { d: 100, b: 100, t: 10 },
    "double-angle": { d: 100, b: 100, t: 10, gap: 10 },
    channel: { d: 200, bf: 75, tf: 11.5, tw: 8.5 },
    chs: { D: 88.9, t: 5 },
    rhs: { b: 100, h: 100, t: 5 },
    round: { D: 25 },
    rectangle: { b: 100, h: 20 },
    timber: { b: 45, d: 195 },
    properties: { A: 2865, rmin: 46.5 },
  },
  in: {
    angle: { d: 4, b: 4, t: 0.375 },
    "double-angle": { d: 4, b: 4, t: 0.375, gap: 0.375 },
    channel: { d: 8, bf: 2.26, tf: 0.39, tw: 0.22 },
    chs: { D: 3.5, t: 0.216 },
    rhs: { b: 4, h: 4, t: 0.233 },
    round: { D: 1 },
    rectangle: { b: 4, h: 0.75 },
    timber: { b: 1.5, d: 7.25 },
    properties: { A: 4.3, rmin: 1.95 },
  },
};

/** Shapes each material is checked for: the steel checks take steel shapes, the NDS check solid timber sections. */
export function shapesFor(material: string): SelectOption[] {
  const allowed: readonly SectionShapeName[] = material === "timber-nds" ? ["timber", "rectangle", "round", "properties"] : sectionShapes.filter((s) => s !== "timber");
  return allowed.map((s) => ({ value: s, label: NAMES[s] }));
}

/** The dimensions (or properties) a shape is entered by. */
export function sectionFields(shape: string): SectionField[] {
  return isShape(shape) ? FIELDS[shape] : [];
}

/** A new section of `shape`, keeping the dimensions the old one shares with it (an angle's legs when it becomes a double angle). */
export function switchShape(old: Readonly<Record<string, unknown>>, shape: SectionShapeName, length: "mm" | "in"): Record<string, string | number> {
  const next: Record<string, string | number> = { shape, ...DEFAULTS[length][shape] };
  for (const f of FIELDS[shape]) {
    const v = old[f.key];
    if (typeof v === "number") next[f.key] = v;
  }
  if (shape === "timber") next.product = old.product === "glulam" ? "glulam" : "sawn";
  return next;
}

/** The default section of a material: a hollow section for steel, sawn lumber for timber. */
export function defaultSection(material: string, length: "mm" | "in"): Record<string, string | number> {
  return material === "timber-nds" ? switchShape({}, "timber", length) : switchShape({}, "rhs", length);
}

export function isShape(s: unknown): s is SectionShapeName {
  return sectionShapes.some((x) => x === s);
}

function dim(key: string, name: string): SectionField {
  return { key, label: key === "cornerRadius" ? "r corner" : key, name };
}
