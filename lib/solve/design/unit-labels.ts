import { z } from "zod";

/**
 * Unit labels printed beside quantities in the steps. The design functions are
 * unit-consistent (stress × area = force), so these are labels only: nothing
 * is converted.
 */
export type UnitLabels = {
  /** Force, e.g. `kip`, `N`, `lbf`. */
  force: string;
  /** Length, e.g. `in`, `mm`. Areas and second moments are printed as its square and fourth power. */
  length: string;
  /** Stress and modulus, e.g. `ksi`, `MPa`, `psi`. */
  stress: string;
};

/** Consistent unit sets: kip, in, ksi · lbf, in, psi · N, mm, MPa. */
export type UnitSystem = "kip-in" | "lb-in" | "N-mm";

/** A unit system by name, or individual labels over the function's default system. */
export type UnitsOption = UnitSystem | Partial<UnitLabels>;

/** Labels with derived area and second-moment labels. */
export type ResolvedUnits = UnitLabels & { area: string; inertia: string };

const SYSTEMS: Record<UnitSystem, UnitLabels> = {
  "kip-in": { force: "kip", length: "in", stress: "ksi" },
  "lb-in": { force: "lbf", length: "in", stress: "psi" },
  "N-mm": { force: "N", length: "mm", stress: "MPa" },
};

/** zod schema for the optional `units` input of every design function. */
export const unitsOptionSchema = z
  .union([
    z.enum(["kip-in", "lb-in", "N-mm"]),
    z.object({ force: z.string().optional(), length: z.string().optional(), stress: z.string().optional() }),
  ])
  .optional();

/** Resolves a `units` option against the function's default system (or no labels when `fallback` is null). */
export function resolveUnits(option: UnitsOption | undefined, fallback: UnitSystem | null): ResolvedUnits {
  const base: UnitLabels = fallback ? SYSTEMS[fallback] : { force: "", length: "", stress: "" };
  const labels = typeof option === "string" ? SYSTEMS[option] : { ...base, ...option };
  const l = labels.length.trim();
  return { ...labels, area: l ? `${l}^2` : "", inertia: l ? `${l}^4` : "" };
}
