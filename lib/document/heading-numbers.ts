/** The least a node needs for numbering: its type and, for headings, a level. */
type NumberableNode = { type?: string; attrs?: Record<string, unknown> | null };

/**
 * Automatic heading numbers (1, 1.1, 1.1.1 …) by position of top-level
 * heading nodes. Shared by the editor's outline and the exports, so the
 * number an engineer sees while writing is the number printed on the sheet.
 */
export function headingNumbers(doc: { content?: readonly NumberableNode[] }): Map<number, string> {
  const counters = [0, 0, 0, 0];
  const out = new Map<number, string>();
  (doc.content ?? []).forEach((node, index) => {
    if (node.type !== "heading") return;
    const level = Math.min(4, Math.max(1, Number(node.attrs?.level ?? 1)));
    counters[level - 1] += 1;
    for (let i = level; i < counters.length; i++) counters[i] = 0;
    out.set(index, counters.slice(0, level).map((n) => Math.max(n, 1)).join("."));
  });
  return out;
}
