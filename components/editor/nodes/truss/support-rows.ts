import type { SupportDraft } from "./truss-draft";

/** A support as a table row: the reaction line of a roller split into its two components. */
export type SupportRow = { joint: string; type: string; dx?: number; dy?: number };

export function supportRows(supports: readonly SupportDraft[]): SupportRow[] {
  return supports.map((s) => ({ joint: s.joint, type: s.type, dx: s.direction?.[0], dy: s.direction?.[1] }));
}

/**
 * Rows back to supports. Both components blank means the default vertical
 * line; one given and the other blank reads the blank as 0, so typing
 * "1" under x alone gives a horizontal reaction line.
 */
export function supportsFromRows(rows: readonly SupportRow[]): SupportDraft[] {
  return rows.map((r) => {
    const type = r.type === "roller" ? "roller" : "pin";
    if (r.dx === undefined && r.dy === undefined) return { joint: r.joint, type };
    return { joint: r.joint, type, direction: [r.dx ?? 0, r.dy ?? 0] };
  });
}
