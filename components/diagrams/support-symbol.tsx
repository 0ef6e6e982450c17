import type { SupportSpec } from "./build-scene";
import { FADED_OPACITY, PALETTE } from "./diagram-palette";

export type SupportSymbolProps = { spec: SupportSpec; background: string };

/** Short hatch strokes under a ground line, drawn upright; the whole symbol is rotated as one. */
function groundHatch(y: number): string {
  let d = `M-14 ${y}H14`;
  for (let x = -11; x <= 13; x += 6) d += `M${x} ${y}l-5 6`;
  return d;
}

/**
 * Support symbols drawn upright with the apex at the joint, then rotated along
 * the restrained direction. A pin is a tall triangle straight on the ground;
 * a roller is a squat triangle riding on two wheels, so the two differ in
 * outline, not just in size.
 */
export function SupportSymbol({ spec, background }: SupportSymbolProps) {
  const { at, type, rotation, joint } = spec;
  return (
    <g
      data-support={joint}
      data-type={type}
      transform={`translate(${at.x} ${at.y})${rotation ? ` rotate(${rotation})` : ""}`}
      opacity={spec.faded ? FADED_OPACITY : undefined}
      stroke={PALETTE.ink}
      strokeWidth={1.25}
    >
      <title>{`${type === "pin" ? "Pin" : "Roller"} support at ${joint}`}</title>
      {type === "pin" ? (
        <>
          <path d="M0 0L-10 17H10Z" fill={background} strokeLinejoin="round" />
          <path d={groundHatch(17)} fill="none" strokeWidth={1} />
        </>
      ) : (
        <>
          <path d="M0 0L-10 12H10Z" fill={background} strokeLinejoin="round" />
          <circle cx={-5} cy={15.5} r={3.2} fill={background} />
          <circle cx={5} cy={15.5} r={3.2} fill={background} />
          <path d={groundHatch(19.5)} fill="none" strokeWidth={1} />
        </>
      )}
    </g>
  );
}
