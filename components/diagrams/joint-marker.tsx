import type { JointSpec } from "./build-scene";
import { FADED_OPACITY, PALETTE } from "./diagram-palette";

export type JointMarkerProps = { spec: JointSpec; background: string };

/**
 * A joint: a small open circle (members meet at a pin, not a weld), a
 * verdigris ring when highlighted, and a caution square with "!" when its
 * input is wrong, so the error reads without colour.
 */
export function JointMarker({ spec, background }: JointMarkerProps) {
  const { at, label } = spec;
  const labelColor = spec.invalid ? PALETTE.caution : spec.highlighted ? PALETTE.verdigris : PALETTE.ink;
  return (
    <g data-joint={spec.id} opacity={spec.faded ? FADED_OPACITY : undefined} pointerEvents="none">
      {spec.highlighted && <circle cx={at.x} cy={at.y} r={8} fill="none" stroke={PALETTE.verdigris} strokeWidth={2} />}
      {spec.invalid && (
        <rect x={at.x - 7} y={at.y - 7} width={14} height={14} fill="none" stroke={PALETTE.caution} strokeWidth={1.5} strokeDasharray="3 2" data-invalid-marker="" />
      )}
      <circle cx={at.x} cy={at.y} r={3.5} fill={background} stroke={spec.invalid ? PALETTE.caution : PALETTE.ink} strokeWidth={1.5} />
      {label && (
        <text x={label.x} y={label.y} textAnchor={label.anchor} dominantBaseline="middle" fontSize={11} fontWeight={spec.highlighted ? 600 : 500} fill={labelColor}>
          {spec.invalid ? `${spec.id} !` : spec.id}
        </text>
      )}
    </g>
  );
}
