import type { Point } from "./fit-view-box";
import type { MemberStyle } from "./member-style";

export type MemberStrokeProps = {
  a: Point;
  b: Point;
  style: MemberStyle;
  /** Colour of the core of a double line: the drawing's background, so the line reads as two rims. */
  background: string;
  opacity?: number;
};

/** One member's line: single, double (compression) or dotted (zero force), exactly as the legend shows it. */
export function MemberStroke({ a, b, style, background, opacity }: MemberStrokeProps) {
  const line = { x1: a.x, y1: a.y, x2: b.x, y2: b.y };
  return (
    <g opacity={opacity}>
      <line {...line} stroke={style.color} strokeWidth={style.width} strokeDasharray={style.dash} strokeLinecap={style.dash ? "round" : "butt"} />
      {style.core !== undefined && <line {...line} stroke={background} strokeWidth={style.core} />}
    </g>
  );
}
