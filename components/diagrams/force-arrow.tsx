import type { ArrowScene } from "./build-scene";
import { FADED_OPACITY, PALETTE } from "./diagram-palette";

export type ForceArrowProps = { spec: ArrowScene; kind: "load" | "reaction" };

/**
 * A load (ink, filled head) or a reaction (verdigris, open head): told apart
 * by the head's shape as well as the colour. The label carries magnitude and unit.
 */
export function ForceArrow({ spec, kind }: ForceArrowProps) {
  const color = kind === "load" ? PALETTE.ink : PALETTE.verdigris;
  const { path, label } = spec;
  return (
    <g data-arrow={kind} data-joint={spec.joint} opacity={spec.faded ? FADED_OPACITY : undefined} pointerEvents="none">
      <path d={path.shaft} stroke={color} strokeWidth={1.5} fill="none" />
      <path d={path.head} fill={kind === "load" ? color : PALETTE.paperRaised} stroke={color} strokeWidth={kind === "load" ? 0 : 1.25} strokeLinejoin="round" />
      <text x={label.x} y={label.y} textAnchor={label.anchor} dominantBaseline="middle" fontSize={10.5} fill={color} className="pp-num" style={{ fontFamily: "var(--font-num), ui-monospace, monospace" }}>
        {spec.text}
      </text>
    </g>
  );
}
