import type { CaseResult, JointLoad, TrussModel } from "@/lib/solve";
import type { ArrowPath } from "./arrow-path";
import { buildMemberSpecs } from "./build-member-specs";
import type { Point, ViewBox } from "./fit-view-box";
import { forceArrows, type ArrowSpec } from "./force-arrows";
import { jointLoadVectors, reactionVectors } from "./force-vectors";
import { jointLabelPosition } from "./joint-label-position";
import type { LabelPosition } from "./member-label-position";
import type { ForceSense, MemberStyle } from "./member-style";
import { estimateTextWidth, labelBox, placeLabels, type Box } from "./place-labels";
import { placeTruss } from "./place-truss";
import { sectionLine } from "./section-line";
import { supportRotation } from "./support-rotation";

export type MemberSpec = {
  id: string;
  a: Point;
  b: Point;
  style: MemberStyle;
  label?: { text: string; force?: string; at: LabelPosition };
  highlighted: boolean;
  invalid: boolean;
  /** "cut": drawn solid from `keptEnd` to the section (the midpoint), faded beyond. */
  part: "whole" | "faded" | "cut";
  keptEnd?: Point;
  /** The assumed-tension force on the free body at the section, pointing away from it. */
  cutArrow?: ArrowPath;
  /** What a screen reader announces for the member. */
  name: string;
};
export type JointSpec = { id: string; at: Point; label?: LabelPosition; highlighted: boolean; invalid: boolean; faded: boolean };
export type SupportSpec = { key: string; joint: string; at: Point; type: "pin" | "roller"; rotation: number; faded: boolean };
export type ArrowScene = ArrowSpec & { faded: boolean };

export type Scene = {
  view: ViewBox;
  members: MemberSpec[];
  joints: JointSpec[];
  supports: SupportSpec[];
  loads: ArrowScene[];
  reactions: ArrowScene[];
  cutLine: Point[];
  maxForce: number;
  /** Senses present among drawn members, so the legend lists only what the drawing shows. */
  senses: ForceSense[];
  skippedMembers: string[];
};

export type BuildSceneOptions = {
  model: TrussModel;
  result?: CaseResult;
  loads: readonly JointLoad[];
  forceUnit: string;
  showForces: boolean;
  showReactions: boolean;
  showJointLabels: boolean;
  showMemberLabels: boolean;
  highlightMembers?: readonly string[];
  highlightJoints?: readonly string[];
  invalidMembers?: readonly string[];
  invalidJoints?: readonly string[];
  cutMembers?: readonly string[];
  keptJoints?: readonly string[];
  width?: number;
  maxHeight?: number;
};

/** Support symbols reach about this far from their joint; arrows on that side stop short of them. */
const SUPPORT_REACH = 30;
/** A shaft closer than this to a member's direction (cos 25°) would be drawn on top of it. */
const ALONG_MEMBER = 0.9;
/** A joint label tries the emptiest side first, then turns either way round the joint. */
const JOINT_LABEL_TURNS = [0, Math.PI / 4, -Math.PI / 4, Math.PI / 2, -Math.PI / 2, Math.PI];

/** Everything the diagram draws, in SVG coordinates, computed without React so it can be tested directly. */
export function buildScene(o: BuildSceneOptions): Scene {
  // Room for arrows hanging above or below the chords, reactions under the supports, and the scale bar.
  const margin = { top: 72, right: 64, bottom: 72 + (o.showReactions ? 44 : 0) + 20, left: 64 };
  const placed = placeTruss(o.model, { width: o.width, maxHeight: o.maxHeight, margin });
  const at = (id: string) => placed.joints.get(id)?.at;
  const set = (ids?: readonly string[]) => new Set(ids ?? []);
  const kept = set(o.keptJoints);
  const isFaded = (joint: string) => kept.size > 0 && !kept.has(joint);

  const directions = new Map<string, Point[]>();
  const neighbours = new Map<string, Point[]>();
  for (const m of placed.members) {
    for (const [from, to, id] of [[m.a, m.b, m.start], [m.b, m.a, m.end]] as const) {
      const len = Math.hypot(to.x - from.x, to.y - from.y);
      directions.set(id, [...(directions.get(id) ?? []), { x: (to.x - from.x) / len, y: (to.y - from.y) / len }]);
      neighbours.set(id, [...(neighbours.get(id) ?? []), to]);
    }
  }

  /** Unit vectors (SVG axes) from each support joint toward its symbol. */
  const symbolSide = new Map<string, Point>();
  const supports: SupportSpec[] = [];
  (o.model.supports ?? []).forEach((s, i) => {
    const p = at(s.joint);
    if (!p) return;
    const rotation = s.type === "roller" ? supportRotation(s.direction) : 0;
    const rad = (rotation * Math.PI) / 180;
    symbolSide.set(s.joint, { x: -Math.sin(rad), y: Math.cos(rad) });
    supports.push({ key: `${s.joint}:${i}`, joint: s.joint, at: p, type: s.type, rotation, faded: isFaded(s.joint) });
  });

  const towardSymbol = (joint: string, side: Point) => {
    const s = symbolSide.get(joint);
    return s !== undefined && side.x * s.x + side.y * s.y > 0.5;
  };
  const alongMember = (v: { joint: string }, side: Point) => (directions.get(v.joint) ?? []).some((d) => d.x * side.x + d.y * side.y > ALONG_MEMBER);

  const loadVectors = jointLoadVectors(o.loads);
  const reactionVecs = o.showReactions ? reactionVectors(o.model.supports ?? [], o.result?.reactions) : [];
  const largest = Math.max(0, ...[...loadVectors, ...reactionVecs].map((v) => Math.hypot(v.fx, v.fy)));
  const fade = (a: ArrowSpec): ArrowScene => ({ ...a, faded: isFaded(a.joint) });
  const gap = (v: { joint: string }, side: Point) => (towardSymbol(v.joint, side) ? SUPPORT_REACH : 8);
  // A load never crosses its support symbol; a reaction conventionally arrives through it, clear by the gap.
  const loads = forceArrows({ vectors: loadVectors, at, largest, gap, blocked: (v, side) => towardSymbol(v.joint, side) || alongMember(v, side), unit: o.forceUnit }).map(fade);
  const reactions = forceArrows({ vectors: reactionVecs, at, largest, gap, blocked: alongMember, unit: o.forceUnit }).map(fade);
  const arrows = [...loads, ...reactions];

  const obstacles: Box[] = [
    ...[...placed.joints.values()].map(({ at: p }) => ({ x0: p.x - 5, y0: p.y - 5, x1: p.x + 5, y1: p.y + 5 })),
    ...arrows.map(({ path: { tail, tip } }) => ({ x0: Math.min(tail.x, tip.x) - 4, y0: Math.min(tail.y, tip.y) - 4, x1: Math.max(tail.x, tip.x) + 4, y1: Math.max(tail.y, tip.y) + 4 })),
    ...arrows.map((a) => labelBox(a.label, estimateTextWidth(a.text, 10.5), 12)),
    ...supports.map(({ joint, at: p }) => {
      const side = symbolSide.get(joint) ?? { x: 0, y: 1 };
      const c = { x: p.x + side.x * 13, y: p.y + side.y * 13 };
      return { x0: c.x - 15, y0: c.y - 15, x1: c.x + 15, y1: c.y + 15 };
    }),
  ];
  const jointLabels = o.showJointLabels
    ? placeLabels(
        [...placed.joints.values()].map((j) => ({
          key: j.id,
          candidates: JOINT_LABEL_TURNS.map((t) => jointLabelPosition(j.at, neighbours.get(j.id) ?? [], 13, t)),
          width: estimateTextWidth(j.id, 11),
          height: 13,
        })),
        obstacles,
      )
    : new Map<string, LabelPosition>();
  const highlightJ = set(o.highlightJoints);
  const invalidJ = set(o.invalidJoints);
  const joints: JointSpec[] = [...placed.joints.values()].map((j) => {
    const label = jointLabels.get(j.id);
    if (label) obstacles.push(labelBox(label, estimateTextWidth(j.id, 11), 13));
    return { id: j.id, at: j.at, label, highlighted: highlightJ.has(j.id), invalid: invalidJ.has(j.id), faded: isFaded(j.id) };
  });

  const cut = set(o.cutMembers);
  const { members, senses, maxForce } = buildMemberSpecs({
    members: placed.members,
    forces: o.result?.forces,
    forceUnit: o.forceUnit,
    showForces: o.showForces,
    showMemberLabels: o.showMemberLabels,
    selected: new Set([...set(o.highlightMembers), ...cut]),
    invalid: set(o.invalidMembers),
    kept,
    obstacles,
  });

  const cutLine = sectionLine(placed.members.filter((m) => cut.has(m.id)));
  const present = (["tension", "compression", "zero", "unknown"] as const).filter((s) => senses.has(s));
  return { view: placed.view, members, joints, supports, loads, reactions, cutLine, maxForce, senses: present, skippedMembers: placed.skippedMembers };
}
