import { PALETTE } from "./diagram-palette";

/** How a member is drawn. `unknown` is a member with no result yet (geometry only). */
export type ForceSense = "tension" | "compression" | "zero" | "unknown";

export type MemberStyle = {
  sense: ForceSense;
  color: string;
  /** Overall stroke width in SVG units (for a double line, the outer width). */
  width: number;
  /** SVG dash array, or undefined for a continuous line. */
  dash?: string;
  /** Width of the paper-coloured core that turns the stroke into two parallel lines; compression only. */
  core?: number;
};

export type MemberStyleOptions = {
  minWidth?: number;
  maxWidth?: number;
  /** Forces at or below this fraction of the largest are drawn as zero; absorbs solver round-off. */
  relativeZero?: number;
};

/** The widest outer stroke at which a double line still shows its two rims. */
const MIN_DOUBLE_WIDTH = 3;

/** The sense of a force, with round-off relative to the largest force treated as zero. */
export function forceSense(force: number | undefined, maxAbs: number, relativeZero = 1e-6): ForceSense {
  if (force === undefined || !Number.isFinite(force)) return "unknown";
  const tolerance = Math.max(1e-9, relativeZero * (Number.isFinite(maxAbs) ? maxAbs : 0));
  if (Math.abs(force) <= tolerance) return "zero";
  return force > 0 ? "tension" : "compression";
}

/**
 * Tension: solid blue. Compression: brick, drawn as a double line (a hollow
 * stroke), so the two differ in print and for colour-blind readers as well.
 * Zero force: thin grey dots. Width grows linearly with |N| between the clamps.
 */
export function memberStyle(force: number | undefined, maxAbs: number, options: MemberStyleOptions = {}): MemberStyle {
  const { minWidth = 2, maxWidth = 8, relativeZero = 1e-6 } = options;
  const sense = forceSense(force, maxAbs, relativeZero);
  if (sense === "unknown") return { sense, color: PALETTE.ink, width: 1.75 };
  if (sense === "zero") return { sense, color: PALETTE.inkFaint, width: 1.25, dash: "0.1 3.5" };

  const ratio = maxAbs > 0 ? Math.min(1, Math.abs(force ?? 0) / maxAbs) : 1;
  const width = minWidth + (maxWidth - minWidth) * ratio;
  if (sense === "tension") return { sense, color: PALETTE.tension, width };
  const outer = Math.max(MIN_DOUBLE_WIDTH, width);
  return { sense, color: PALETTE.compression, width: outer, core: Math.max(1, outer * 0.42) };
}

/** The largest |N| among finite forces; 0 when there are none. */
export function maxAbsForce(forces: Record<string, number> | undefined): number {
  let max = 0;
  for (const f of Object.values(forces ?? {})) if (Number.isFinite(f)) max = Math.max(max, Math.abs(f));
  return max;
}

/** A member whose input is wrong: caution colour, long dashes, whatever its force, so it stands out. */
export function invalidMemberStyle(base: MemberStyle): MemberStyle {
  return { sense: base.sense, color: PALETTE.caution, width: Math.max(2.5, base.width), dash: "7 4" };
}
