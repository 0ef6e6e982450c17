import type { JSONContent } from "@tiptap/core";

/** Automatic heading numbers (1, 1.1, 1.1.1 …) by position of top-level heading nodes. */
export function headingNumbers(doc: JSONContent): Map<number, string> {
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
