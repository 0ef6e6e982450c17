import { arrowPath, type ArrowPath } from "./arrow-path";
import type { MemberSpec } from "./build-scene";
import { describeMember } from "./describe-member";
import type { Point } from "./fit-view-box";
import { formatNumber } from "./format-number";
import { freeBodyPart } from "./free-body-part";
import { memberLabelPosition, type LabelPosition } from "./member-label-position";
import { maxAbsForce, memberStyle, type ForceSense } from "./member-style";
import { estimateTextWidth, placeLabels, type Box } from "./place-labels";
import type { PlacedMember } from "./place-truss";

export type BuildMemberSpecsOptions = {
  members: PlacedMember[];
  forces?: Record<string, number>;
  forceUnit: string;
  showForces: boolean;
  showMemberLabels: boolean;
  selected: ReadonlySet<string>;
  invalid: ReadonlySet<string>;
  /** Joints of the kept side in free-body mode; empty for the whole truss. */
  kept: ReadonlySet<string>;
  /** Joint labels, arrow labels and markers that member labels must avoid. */
  obstacles: Box[];
};

export const MEMBER_LABEL_FONT = 10;

/** Along the member and to either side, best first: the conventional midpoint above, then alternatives. */
const LABEL_TRIES: { t: number; flip: boolean }[] = [
  { t: 0.5, flip: false },
  { t: 0.5, flip: true },
  { t: 0.36, flip: false },
  { t: 0.64, flip: false },
  { t: 0.36, flip: true },
  { t: 0.64, flip: true },
];

/** Members with their style by force, free-body part, label text and a label spot clear of the others. */
export function buildMemberSpecs(o: BuildMemberSpecsOptions): { members: MemberSpec[]; senses: Set<ForceSense>; maxForce: number } {
  const maxForce = maxAbsForce(o.forces);
  const senses = new Set<ForceSense>();
  const freeBody = o.kept.size > 0;
  const members = o.members.map((m): MemberSpec => {
    const force = o.forces?.[m.id];
    const style = memberStyle(force, maxForce);
    senses.add(style.sense);
    const fb = freeBody ? freeBodyPart(m.start, m.end, o.kept) : "kept";
    const keptEnd = typeof fb === "object" ? (fb.cutKeeps === "start" ? m.a : m.b) : undefined;
    const forceText = o.showForces && force !== undefined && style.sense !== "unknown" ? forceLabel(force, style.sense) : undefined;
    const text = o.showMemberLabels ? m.id : "";
    const selected = o.selected.has(m.id);
    return {
      id: m.id,
      a: m.a,
      b: m.b,
      style,
      label: text || forceText ? { text, force: forceText, at: memberLabelPosition(m.a, m.b, style.width / 2 + 7) } : undefined,
      highlighted: selected,
      invalid: o.invalid.has(m.id),
      part: fb === "kept" ? "whole" : fb === "dropped" ? "faded" : "cut",
      keptEnd,
      cutArrow: keptEnd ? cutArrow(keptEnd, keptEnd === m.a ? m.b : m.a) : undefined,
      name: describeMember({ id: m.id, start: m.start, end: m.end, sense: style.sense, force, unit: o.forceUnit, selected, invalid: o.invalid.has(m.id) }),
    };
  });

  const height = MEMBER_LABEL_FONT + 2;
  const placed = placeLabels(
    members.flatMap((m) => {
      if (!m.label) return [];
      const width = estimateTextWidth(`${m.label.text} ${m.label.force ?? ""}`.trim(), MEMBER_LABEL_FONT);
      const candidates: LabelPosition[] = LABEL_TRIES.map((c) => memberLabelPosition(m.a, m.b, m.style.width / 2 + 7, c));
      return [{ key: m.id, candidates, width, height }];
    }),
    o.obstacles,
  );
  for (const m of members) {
    const at = placed.get(m.id);
    if (m.label && at) m.label = { ...m.label, at };
  }
  return { members, senses, maxForce };
}

function forceLabel(force: number, sense: ForceSense): string {
  if (sense === "zero") return "0";
  return `${formatNumber(Math.abs(force))} ${sense === "tension" ? "T" : "C"}`;
}

/** The free-body force at the section: tip just past the cut, tail on the kept half, pointing away (tension assumed). */
function cutArrow(keptEnd: Point, other: Point): ArrowPath | undefined {
  const dir = { x: other.x - keptEnd.x, y: other.y - keptEnd.y };
  const n = Math.hypot(dir.x, dir.y);
  if (!(n > 0)) return undefined;
  const mid = { x: (keptEnd.x + other.x) / 2, y: (keptEnd.y + other.y) / 2 };
  const tip = { x: mid.x + (dir.x / n) * 4, y: mid.y + (dir.y / n) * 4 };
  return arrowPath({ tip, direction: dir, length: Math.min(26, (n / 2) * 0.8) }) ?? undefined;
}
