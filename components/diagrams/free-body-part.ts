/**
 * A member's place in a free body: wholly on the kept side, cut by the section
 * (one end kept; the end given is the kept one), or on the discarded side.
 */
export type FreeBodyPart = "kept" | "dropped" | { cutKeeps: "start" | "end" };

export function freeBodyPart(start: string, end: string, kept: ReadonlySet<string>): FreeBodyPart {
  const s = kept.has(start);
  const e = kept.has(end);
  if (s && e) return "kept";
  if (!s && !e) return "dropped";
  return { cutKeeps: s ? "start" : "end" };
}
