import type { KeyboardEvent } from "react";
import { isActivationKey } from "./activation-key";
import type { MemberSpec } from "./build-scene";
import { FADED_OPACITY, PALETTE } from "./diagram-palette";
import { MemberStroke } from "./member-stroke";
import { invalidMemberStyle } from "./member-style";

export type MemberShapeProps = {
  spec: MemberSpec;
  background: string;
  /** Makes the member a button (e.g. to pick members to cut). */
  onActivate?: (memberId: string) => void;
};

/** The hit area is wider than any stroke so a thin zero-force member can still be picked with a mouse. */
const HIT_WIDTH = 16;

/** One member: selection halo, its line, an error marker, and when interactive a focusable hit area. */
export function MemberShape({ spec, background, onActivate }: MemberShapeProps) {
  const { a, b, id } = spec;
  const style = spec.invalid ? invalidMemberStyle(spec.style) : spec.style;
  const mid = { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
  const faded = spec.part === "faded";
  const onKeyDown = (e: KeyboardEvent<SVGGElement>) => {
    if (!onActivate || !isActivationKey(e.key)) return;
    e.preventDefault();
    onActivate(id);
  };
  // No outline: a box round the member's bounding box would frame its neighbours too; focus tints the hit line instead.
  const interactive = onActivate
    ? { role: "button", tabIndex: 0, "aria-label": spec.name, "aria-pressed": spec.highlighted, onClick: () => onActivate(id), onKeyDown }
    : {};

  return (
    <g data-member={id} data-sense={style.sense} className={onActivate ? "group cursor-pointer outline-none" : undefined} {...interactive}>
      <title>{spec.name}</title>
      {spec.highlighted && (
        <line x1={a.x} y1={a.y} x2={b.x} y2={b.y} stroke={PALETTE.verdigris} strokeOpacity={0.3} strokeWidth={style.width + 9} strokeLinecap="round" />
      )}
      {spec.part === "cut" && spec.keptEnd ? (
        <>
          <MemberStroke a={spec.keptEnd} b={mid} style={style} background={background} />
          <MemberStroke a={mid} b={spec.keptEnd === a ? b : a} style={style} background={background} opacity={FADED_OPACITY} />
        </>
      ) : (
        <MemberStroke a={a} b={b} style={style} background={background} opacity={faded ? FADED_OPACITY : undefined} />
      )}
      {spec.cutArrow && (
        <g data-cut-force={id}>
          <path d={spec.cutArrow.shaft} stroke={PALETTE.ink} strokeWidth={1.5} fill="none" />
          <path d={spec.cutArrow.head} fill={PALETTE.ink} />
        </g>
      )}
      {spec.invalid && <InvalidMarker x={mid.x} y={mid.y} />}
      {onActivate && (
        <line
          x1={a.x}
          y1={a.y}
          x2={b.x}
          y2={b.y}
          stroke={PALETTE.verdigris}
          strokeOpacity={0}
          strokeWidth={HIT_WIDTH}
          strokeLinecap="round"
          // Invisible by attribute (so it stays invisible without our stylesheet); hover and focus tint it by class.
          className="group-hover:[stroke-opacity:0.15] group-focus-visible:[stroke-opacity:0.4]"
          pointerEvents="stroke"
        />
      )}
    </g>
  );
}

/** A caution diamond with "!" — a shape as well as a colour, so an error shows in greyscale print too. */
export function InvalidMarker({ x, y }: { x: number; y: number }) {
  return (
    <g transform={`translate(${x} ${y})`} data-invalid-marker="">
      <path d="M0 -8L8 0L0 8L-8 0Z" fill={PALETTE.cautionLight} stroke={PALETTE.caution} strokeWidth={1.5} />
      <text y={0.5} textAnchor="middle" dominantBaseline="middle" fontSize={10} fontWeight={700} fill={PALETTE.caution}>
        !
      </text>
    </g>
  );
}
