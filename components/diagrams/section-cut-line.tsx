import { PALETTE } from "./diagram-palette";
import type { Point } from "./fit-view-box";
import { wavePath } from "./wave-path";

export type SectionCutLineProps = { points: Point[] };

/** The section line across the cut members: wavy and dashed, so it is never read as a member. */
export function SectionCutLine({ points }: SectionCutLineProps) {
  if (points.length < 2) return null;
  return (
    <path data-section-line="" pointerEvents="none" d={wavePath(points)} fill="none" stroke={PALETTE.ink} strokeWidth={1.5} strokeDasharray="9 3 2 3" strokeLinecap="round" />
  );
}
