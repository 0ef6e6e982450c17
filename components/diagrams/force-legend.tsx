import type { ReactNode } from "react";
import { PALETTE } from "./diagram-palette";
import { formatNumber } from "./format-number";
import { MemberStroke } from "./member-stroke";
import { invalidMemberStyle, memberStyle, type ForceSense } from "./member-style";

export type ForceLegendProps = {
  /** Which member senses to explain; default tension, compression and zero force. */
  senses?: readonly ForceSense[];
  /** The largest |N| drawn, stated beside the width key. */
  maxForce?: number;
  unit?: string;
  showSelected?: boolean;
  showInvalid?: boolean;
  showLoads?: boolean;
  showReactions?: boolean;
  /** Must match the diagram's background so the double line reads the same. */
  background?: string;
  className?: string;
};

const A = { x: 2, y: 7 };
const B = { x: 34, y: 7 };

/**
 * The diagram's key. Swatches are drawn with the same style function and
 * stroke component as the members, so the key cannot drift from the drawing;
 * every entry also names the sense in words.
 */
export function ForceLegend({
  senses = ["tension", "compression", "zero"],
  maxForce,
  unit = "",
  showSelected = false,
  showInvalid = false,
  showLoads = false,
  showReactions = false,
  background = PALETTE.paperRaised,
  className,
}: ForceLegendProps) {
  const has = (s: ForceSense) => senses.includes(s);
  const u = unit ? ` ${unit}` : "";
  return (
    <ul aria-label="Diagram legend" className={`flex flex-wrap gap-x-5 gap-y-1.5 text-xs text-ink-soft ${className ?? ""}`}>
      {has("tension") && <Item swatch={<MemberStroke a={A} b={B} style={memberStyle(0.5, 1)} background={background} />}>Tension (T), solid line</Item>}
      {has("compression") && <Item swatch={<MemberStroke a={A} b={B} style={memberStyle(-0.5, 1)} background={background} />}>Compression (C), double line</Item>}
      {has("zero") && <Item swatch={<MemberStroke a={A} b={B} style={memberStyle(0, 1)} background={background} />}>Zero force, dotted</Item>}
      {(has("tension") || has("compression")) && (
        <Item swatch={<WidthKey />}>
          Width grows with |N|
          {maxForce !== undefined && maxForce > 0 && (
            <>
              {"; widest "}
              <span className="pp-num text-ink">{`${formatNumber(maxForce)}${u}`}</span>
            </>
          )}
        </Item>
      )}
      {showSelected && (
        <Item
          swatch={
            <>
              <line x1={A.x} y1={A.y} x2={B.x} y2={B.y} stroke={PALETTE.verdigris} strokeOpacity={0.3} strokeWidth={11} strokeLinecap="round" />
              <MemberStroke a={A} b={B} style={memberStyle(undefined, 1)} background={background} />
            </>
          }
        >
          Selected member
        </Item>
      )}
      {showInvalid && <Item swatch={<MemberStroke a={A} b={B} style={invalidMemberStyle(memberStyle(undefined, 1))} background={background} />}>Input error (!)</Item>}
      {showLoads && <Item swatch={<Arrow open={false} />}>Load</Item>}
      {showReactions && <Item swatch={<Arrow open />}>Reaction</Item>}
    </ul>
  );
}

function Item({ swatch, children }: { swatch: ReactNode; children: ReactNode }) {
  return (
    <li className="inline-flex items-center gap-2">
      <svg width={36} height={14} viewBox="0 0 36 14" aria-hidden="true" focusable="false">
        {swatch}
      </svg>
      <span>{children}</span>
    </li>
  );
}

/** A wedge from thin to thick: the magnitude key, in neutral ink since it applies to both senses. */
function WidthKey() {
  const thin = memberStyle(0.001, 1).width / 2;
  const thick = memberStyle(1, 1).width / 2;
  return <path d={`M2 ${7 - thin}L34 ${7 - thick}V${7 + thick}L2 ${7 + thin}Z`} fill={PALETTE.inkSoft} />;
}

function Arrow({ open }: { open: boolean }) {
  const color = open ? PALETTE.verdigris : PALETTE.ink;
  return (
    <>
      <path d="M3 7H26" stroke={color} strokeWidth={1.5} />
      <path d="M34 7L26 3.4V10.6Z" fill={open ? PALETTE.paperRaised : color} stroke={color} strokeWidth={open ? 1.25 : 0} />
    </>
  );
}
