import type { TrussModel } from "@/lib/solve";
import type { TrussDraft } from "./truss-draft";

/**
 * A model to draw while the inputs do not solve: every joint with both
 * coordinates, every member and support, and the joint loads (line loads are
 * lumped by the runtime only once the geometry is valid). Never solved.
 */
export function draftModel(draft: TrussDraft): TrussModel {
  const joints = draft.joints.flatMap((j) => (j.x !== undefined && j.y !== undefined ? [{ id: j.id, x: j.x, y: j.y }] : []));
  return {
    units: { length: draft.units.length, force: draft.units.force },
    joints,
    members: draft.members.map((m) => ({ id: m.id, start: m.start, end: m.end })),
    supports: draft.supports.map((s) => ({ joint: s.joint, type: s.type, ...(s.direction ? { direction: s.direction } : {}) })),
    loadCases: draft.loadCases.map((c) => ({ id: c.id, loads: c.loads.map((l) => ({ joint: l.joint, fx: l.fx ?? 0, fy: l.fy ?? 0 })) })),
  };
}
