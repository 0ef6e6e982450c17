import type { SelectOption } from "@/components/editor/input-table/input-column";
import type { UnitSystem } from "@/lib/solve";

export const designMaterials = ["steel-aisc360", "steel-en1993", "timber-nds"] as const;
export type DesignMaterial = (typeof designMaterials)[number];

/** Material and standard in one choice: the standard decides which properties a member needs. */
export const materialOptions: SelectOption[] = [
  { value: "steel-aisc360", label: "Steel to AISC 360-16 (chapters D, E)" },
  { value: "steel-en1993", label: "Steel to EN 1993-1-1 (6.2.3, 6.3.1)" },
  { value: "timber-nds", label: "Timber to NDS 2018 (3.6–3.8, column stability)" },
];

/** One material property of a member row: a number (stress or plain) or a choice. */
export type PropertyField = {
  key: string;
  /** Short symbol shown above the field, e.g. "fy". */
  label: string;
  /** Spoken name, e.g. "yield strength fy". */
  name: string;
  kind: "number" | "select";
  unit: "stress" | "area" | "none";
  /** Optional fields: what a blank means. */
  blankMeans?: string;
  options?: SelectOption[];
};

const FIELDS: Record<DesignMaterial, PropertyField[]> = {
  "steel-aisc360": [
    num("Fy", "Fy", "yield stress Fy", "stress"),
    num("Fu", "Fu", "tensile strength Fu", "stress"),
    num("E", "E", "modulus E", "stress"),
    { key: "method", label: "method", name: "design method", kind: "select", unit: "none", blankMeans: "LRFD", options: [{ value: "LRFD", label: "LRFD (φ)" }, { value: "ASD", label: "ASD (Ω)" }] },
    { ...num("An", "An", "net area An", "area"), blankMeans: "gross area" },
    { ...num("U", "U", "shear lag factor U (Table D3.1)", "none"), blankMeans: "1.0" },
  ],
  "steel-en1993": [
    num("fy", "fy", "yield strength fy", "stress"),
    num("fu", "fu", "ultimate strength fu", "stress"),
    num("E", "E", "modulus E", "stress"),
    { key: "curve", label: "curve", name: "buckling curve (Table 6.2)", kind: "select", unit: "none", options: ["a0", "a", "b", "c", "d"].map((c) => ({ value: c, label: c })) },
    { ...num("Anet", "Anet", "net area Anet", "area"), blankMeans: "gross area" },
    { ...num("gammaM0", "γM0", "partial factor γM0", "none"), blankMeans: "1.00" },
    { ...num("gammaM1", "γM1", "partial factor γM1", "none"), blankMeans: "1.00" },
    { ...num("gammaM2", "γM2", "partial factor γM2", "none"), blankMeans: "1.25" },
  ],
  "timber-nds": [
    num("FcStar", "Fc*", "adjusted compression Fc* (all factors but Cp)", "stress"),
    num("FtPrime", "F′t", "adjusted tension F′t", "stress"),
    num("EminPrime", "E′min", "adjusted stability modulus E′min", "stress"),
    { key: "c", label: "c", name: "column parameter c (§3.7.1)", kind: "select", unit: "none", options: [{ value: "sawn", label: "sawn, 0.8" }, { value: "round", label: "round pole, 0.85" }, { value: "glulam", label: "glulam or SCL, 0.9" }] },
    { ...num("An", "An", "net area An", "area"), blankMeans: "gross area" },
  ],
};

/**
 * Starting properties per material and design unit set. Steel: ASTM A992
 * (Fy 50 ksi, Fu 65 ksi) for AISC, S355 to EN 1993-1-1 Table 3.1 (t ≤ 40 mm)
 * for Eurocode. Timber: reference values of Douglas Fir-Larch No. 1 (NDS
 * Supplement Table 4A) with every adjustment factor at 1.0, which the engineer
 * must adjust for the service conditions.
 */
const DEFAULTS: Record<DesignMaterial, Record<UnitSystem, Record<string, number | string>>> = {
  "steel-aisc360": {
    "kip-in": { Fy: 50, Fu: 65, E: 29000 },
    "lb-in": { Fy: 50000, Fu: 65000, E: 29000000 },
    "N-mm": { Fy: 345, Fu: 450, E: 200000 },
  },
  "steel-en1993": {
    "kip-in": { fy: 51.5, fu: 74, E: 30460, curve: "a" },
    "lb-in": { fy: 51500, fu: 74000, E: 30460000, curve: "a" },
    "N-mm": { fy: 355, fu: 510, E: 210000, curve: "a" },
  },
  "timber-nds": {
    "kip-in": { FcStar: 1.5, FtPrime: 0.675, EminPrime: 620, c: "sawn" },
    "lb-in": { FcStar: 1500, FtPrime: 675, EminPrime: 620000, c: "sawn" },
    "N-mm": { FcStar: 10.3, FtPrime: 4.65, EminPrime: 4275, c: "sawn" },
  },
};

export function propertyFields(material: DesignMaterial): PropertyField[] {
  return FIELDS[material];
}

export function propertyDefaults(material: DesignMaterial, system: UnitSystem): Record<string, number | string> {
  return { ...DEFAULTS[material][system] };
}

/** The stored material, or the inputs' default standard for anything else. */
export function readMaterial(raw: unknown): DesignMaterial {
  return designMaterials.find((m) => m === raw) ?? "steel-en1993";
}

function num(key: string, label: string, name: string, unit: PropertyField["unit"]): PropertyField {
  return { key, label, name, kind: "number", unit };
}
