import { SolveError } from "../errors";
import { classifyPoint } from "../geometry/classify-point";
import { indexJoints } from "../geometry/index-joints";
import { lengthTolerance } from "../geometry/length-tolerance";
import { memberAxis } from "../geometry/member-axis";
import type { Joint, Member, TrussModel } from "../types";
import { planEquation } from "./plan-equation";
import { resolvePanel } from "./resolve-panel";
import { splitByCut } from "./split-by-cut";

/** What the proposed cuts must contain or cross; with neither, every solvable cut of a small truss is listed. */
export type ProposeCutsOptions = {
  /** A panel, by index between consecutive bottom joints (from 0 at the left) or by its bottom-chord member id; see resolvePanel. */
  panel?: number | string;
  /** A member every proposed cut must contain. */
  member?: string;
};

/** A cut that divides the truss in two and whose free body gives every cut force from one equation each. */
export type ProposedCut = {
  members: string[];
  /** The two sides' joints, the smaller first. */
  sides: [string[], string[]];
  /** A joint on the smaller side: the free body with fewer forces to list. */
  keep: string;
  /** Moment points off the truss that the working will need (fewer is simpler to check). */
  offTrussPivots: number;
  /** True when one vertical line crosses every cut member (the usual textbook section). */
  straight: boolean;
  description: string;
};

/** Without a member or a panel the search is over all triples; beyond this size it would be slow and the list useless. */
const UNCONSTRAINED_LIMIT = 120;

/**
 * Candidate sections of two or three members, simplest first: straight
 * sections, then fewer moment points off the truss, then a smaller free
 * body, then fewer members.
 */
export function proposeCuts(model: TrussModel, options: ProposeCutsOptions): ProposedCut[] {
  const required: string[] = [];
  if (options.member !== undefined) {
    if (!model.members.some((m) => m.id === options.member)) {
      throw new SolveError("INVALID", `Member ${options.member} is not in the truss.`, { path: "member" });
    }
    required.push(options.member);
  }
  let pool = model.members;
  if (options.panel !== undefined) {
    const panel = resolvePanel(model, options.panel);
    const joints = indexJoints(model);
    pool = model.members.filter((m) => overlaps(xRange(joints, m), [panel.x0, panel.x1]));
    if (panel.chord && !required.includes(panel.chord)) required.push(panel.chord);
    if (required.some((id) => !pool.some((m) => m.id === id))) return [];
  } else if (required.length === 0 && model.members.length > UNCONSTRAINED_LIMIT) {
    throw new SolveError("INVALID", `The truss has ${model.members.length} members; name a member or a panel to cut through.`, { path: "member" });
  }
  const joints = indexJoints(model);
  const tol = lengthTolerance(model);
  const out: ProposedCut[] = [];
  for (const ids of combinations(pool.map((m) => m.id), required)) {
    const proposal = assess(model, joints, tol, ids);
    if (proposal) out.push(proposal);
  }
  return out.sort(
    (a, b) =>
      Number(b.straight) - Number(a.straight) ||
      a.offTrussPivots - b.offTrussPivots ||
      a.sides[0].length - b.sides[0].length ||
      a.members.length - b.members.length ||
      a.members.join(",").localeCompare(b.members.join(",")),
  );
}

function assess(model: TrussModel, joints: Map<string, Joint>, tol: number, ids: string[]): ProposedCut | null {
  const split = splitByCut(model, ids);
  if (!split.ok) return null;
  const sides: [string[], string[]] = split.sides[0].length <= split.sides[1].length ? split.sides : [split.sides[1], split.sides[0]];
  const kept = new Set(sides[0]);
  const members = ids.map((id) => model.members.find((m) => m.id === id) as Member);
  const cut = members.map((m) => ({ id: m.id, axis: memberAxis(joints, m, kept.has(m.start) ? m.start : m.end) }));
  let offTrussPivots = 0;
  const how: string[] = [];
  for (let i = 0; i < cut.length; i++) {
    const plan = planEquation(cut, i, tol);
    if (plan.kind === "unsolvable") return null;
    if (plan.kind === "force sum") {
      how.push(`${cut[i].id} by a force sum`);
      continue;
    }
    const kind = classifyPoint(model, plan.pivot);
    if (kind.kind === "off-truss point") offTrussPivots += 1;
    how.push(`${cut[i].id} by moments about ${kind.kind === "off-truss point" ? "a point off the truss" : `${kind.kind} ${kind.joint}`}`);
  }
  const ranges = members.map((m) => xRange(joints, m));
  const straight = Math.max(...ranges.map((r) => r[0])) < Math.min(...ranges.map((r) => r[1]));
  return {
    members: ids, sides, keep: sides[0][0], offTrussPivots, straight,
    description: `Cut ${ids.join(", ")} and keep the side with ${sides[0].join(", ")}: ${how.join("; ")}.`,
  };
}

function xRange(joints: Map<string, Joint>, m: Member): [number, number] {
  const a = joints.get(m.start)?.x ?? 0;
  const b = joints.get(m.end)?.x ?? 0;
  return [Math.min(a, b), Math.max(a, b)];
}

/** True when the member's x-range shares more than a point with the open interval. */
function overlaps(r: [number, number], interval: [number, number]): boolean {
  return Math.max(r[0], interval[0]) < Math.min(r[1], interval[1]);
}

/** Every set of two or three ids from `pool` that contains all of `required`, each set once, in pool order. */
function* combinations(pool: string[], required: string[]): Generator<string[]> {
  const rest = pool.filter((id) => !required.includes(id));
  for (const size of [2, 3]) {
    const need = size - required.length;
    if (need < 0) continue;
    yield* choose(rest, need, 0, [...required]);
  }
}

function* choose(items: string[], k: number, from: number, picked: string[]): Generator<string[]> {
  if (k === 0) {
    yield picked;
    return;
  }
  for (let i = from; i <= items.length - k; i++) yield* choose(items, k - 1, i + 1, [...picked, items[i]]);
}
