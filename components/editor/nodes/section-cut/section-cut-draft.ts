/** A Section cut calc's inputs as they may stand while the author edits them. */
export type SectionCutDraft = { truss: string; loadCase: string; members: string[]; keep: string; panel?: number | string };

/** Reads the node's inputs defensively: a pasted document may hold anything, and the runtime names the problem. */
export function readSectionCutDraft(raw: unknown): SectionCutDraft {
  const o = typeof raw === "object" && raw !== null ? (raw as Record<string, unknown>) : {};
  const text = (v: unknown) => (typeof v === "string" ? v : "");
  const draft: SectionCutDraft = {
    truss: text(o.truss),
    loadCase: text(o.loadCase),
    members: Array.isArray(o.members) ? o.members.filter((m): m is string => typeof m === "string") : [],
    keep: text(o.keep),
  };
  if (typeof o.panel === "number" || typeof o.panel === "string") draft.panel = o.panel;
  return draft;
}
