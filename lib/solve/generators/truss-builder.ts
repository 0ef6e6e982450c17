import type { Joint, Member, TrussModel } from "../types";

/** Which group a generated member belongs to; the model lists bottom chord, top chord, then webs. */
export type MemberRole = "bottom" | "top" | "web";

/** Section properties and units a generated model carries on every member. */
export type BuildTrussOptions = {
  A?: number;
  E?: number;
  units?: TrussModel["units"];
  /** Joint that gets the pin (left bottom end). */
  pin: string;
  /** Joint that gets the roller with a vertical reaction (right end). */
  roller: string;
};

// Joints this close in x (relative) count as plumb for naming: the same x reached by
// different arithmetic (i·L/n against L/3) differs only by rounding.
const PLUMB_TOLERANCE = 1e-9;

/**
 * Collects joints and members while a shape is laid out, names members by
 * their end joints and assembles the model in the conventional order.
 */
export class TrussBuilder {
  private readonly joints = new Map<string, Joint>();
  private readonly members: { role: MemberRole; member: Member }[] = [];

  /** Adds a joint and returns its id, so layouts can keep ids in chord order. */
  joint(id: string, x: number, y: number): string {
    if (this.joints.has(id)) throw new Error(`generator bug: joint ${id} laid out twice`);
    this.joints.set(id, { id, x, y });
    return id;
  }

  /** Adds a member between two joints, named left joint first (upper first when plumb). */
  member(role: MemberRole, a: string, b: string): void {
    const [start, end] = this.order(a, b);
    this.members.push({ role, member: { id: `${start}${end}`, start, end } });
  }

  /** Adds chord members between consecutive joints of `ids`. */
  chord(role: MemberRole, ids: readonly string[]): void {
    for (let i = 1; i < ids.length; i++) this.member(role, ids[i - 1], ids[i]);
  }

  build(options: BuildTrussOptions): TrussModel {
    const rank: Record<MemberRole, number> = { bottom: 0, top: 1, web: 2 };
    // Array.prototype.sort is stable, so each group keeps the layout's left-to-right order.
    const members = [...this.members]
      .sort((p, q) => rank[p.role] - rank[q.role])
      .map(({ member }) => ({
        ...member,
        ...(options.A !== undefined ? { A: options.A } : {}),
        ...(options.E !== undefined ? { E: options.E } : {}),
      }));
    return {
      ...(options.units ? { units: options.units } : {}),
      joints: [...this.joints.values()],
      members,
      supports: [
        { joint: options.pin, type: "pin" },
        { joint: options.roller, type: "roller" },
      ],
      loadCases: [],
    };
  }

  private order(a: string, b: string): [string, string] {
    const p = this.joints.get(a);
    const q = this.joints.get(b);
    if (!p || !q) throw new Error(`generator bug: member ${a}–${b} uses a joint not laid out`);
    if (Math.abs(p.x - q.x) <= PLUMB_TOLERANCE * Math.max(1, Math.abs(p.x), Math.abs(q.x))) return p.y >= q.y ? [a, b] : [b, a];
    return p.x < q.x ? [a, b] : [b, a];
  }
}
