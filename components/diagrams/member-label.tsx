import type { MemberSpec } from "./build-scene";
import { FADED_OPACITY, PALETTE } from "./diagram-palette";

export type MemberLabelProps = { spec: MemberSpec; background: string };

/**
 * A member's name and, after solving, its force as magnitude with T or C (the
 * word carries the sense, not only the colour). A background-coloured halo
 * keeps it legible where it crosses other lines.
 */
export function MemberLabel({ spec, background }: MemberLabelProps) {
  const label = spec.label;
  if (!label) return null;
  const sense = spec.style.sense;
  const forceColor = sense === "tension" ? PALETTE.tension : sense === "compression" ? PALETTE.compression : PALETTE.inkFaint;
  return (
    <text
      data-member-label={spec.id}
      // Labels lie over members; clicks must reach the member underneath.
      pointerEvents="none"
      x={label.at.x}
      y={label.at.y}
      textAnchor={label.at.anchor}
      dominantBaseline="middle"
      fontSize={10}
      fill={spec.highlighted ? PALETTE.verdigris : PALETTE.inkSoft}
      fontWeight={spec.highlighted ? 600 : 400}
      stroke={background}
      strokeWidth={3}
      strokeLinejoin="round"
      paintOrder="stroke"
      opacity={spec.part === "faded" ? FADED_OPACITY : undefined}
    >
      {label.text}
      {label.force && (
        <tspan dx={label.text ? 4 : 0} fill={forceColor} style={{ fontFamily: "var(--font-num), ui-monospace, monospace" }}>
          {label.force}
        </tspan>
      )}
    </text>
  );
}
