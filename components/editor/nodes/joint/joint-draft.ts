/** A Joint calc's inputs as they may stand while the author edits them. */
export type JointDraft = { truss: string; loadCase: string; joint: string; known: Record<string, number>; sequence: boolean };

/** Reads the node's inputs defensively: a pasted document may hold anything, and the runtime names the problem. */
export function readJointDraft(raw: unknown): JointDraft {
  const o = typeof raw === "object" && raw !== null ? (raw as Record<string, unknown>) : {};
  const text = (v: unknown) => (typeof v === "string" ? v : "");
  const known: Record<string, number> = {};
  if (typeof o.known === "object" && o.known !== null) {
    for (const [member, force] of Object.entries(o.known)) if (typeof force === "number" && Number.isFinite(force)) known[member] = force;
  }
  return { truss: text(o.truss), loadCase: text(o.loadCase), joint: text(o.joint), known, sequence: o.sequence === true };
}
