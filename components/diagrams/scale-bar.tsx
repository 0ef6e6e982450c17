import { PALETTE } from "./diagram-palette";
import { formatNumber } from "./format-number";
import { niceLength } from "./nice-length";

export type ScaleBarProps = {
  x: number;
  y: number;
  /** SVG units per model length unit. */
  scale: number;
  unit?: string;
  /** Longest the bar may be, in SVG units. */
  maxWidth?: number;
};

/** A 1-2-5 scale bar, so a printed sheet can be measured as well as read. */
export function ScaleBar({ x, y, scale, unit = "", maxWidth = 120 }: ScaleBarProps) {
  const length = niceLength(maxWidth / scale);
  const w = length * scale;
  if (!(w >= 12)) return null;
  const ticks = `M${x} ${y - 4}v8M${x + w / 2} ${y - 2.5}v5M${x + w} ${y - 4}v8`;
  return (
    <g data-scale-bar="" fontSize={10} fill={PALETTE.inkSoft}>
      <path d={`M${x} ${y}h${w}${ticks}`} stroke={PALETTE.inkSoft} strokeWidth={1} fill="none" />
      <text x={x + w + 6} y={y} dominantBaseline="middle" style={{ fontFamily: "var(--font-num), ui-monospace, monospace" }}>
        {unit ? `${formatNumber(length)} ${unit}` : formatNumber(length)}
      </text>
    </g>
  );
}
