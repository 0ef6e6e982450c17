import { headingNumbers } from "./heading-numbers";

/** A top-level heading with the number the editor and the export give it (1, 1.1, 1.1.1 …), and its text. */
export type NumberedHeading = { index: number; level: number; number: string; text: string };

/**
 * The package's headings with their numbers (from headingNumbers, the one
 * numbering rule) and their plain text, for linking and quoting them: the
 * plan-review "answered in" picker and the response letter.
 */
export function numberedHeadings(document: unknown): NumberedHeading[] {
  const content = isRecord(document) && Array.isArray(document.content) ? (document.content as unknown[]) : [];
  const nodes = content.map((n) => (isRecord(n) ? { type: typeof n.type === "string" ? n.type : undefined, attrs: isRecord(n.attrs) ? n.attrs : null, content: n.content } : {}));
  const numbers = headingNumbers({ content: nodes });
  const out: NumberedHeading[] = [];
  nodes.forEach((node, index) => {
    const number = numbers.get(index);
    if (number === undefined) return;
    const inline = "content" in node && Array.isArray(node.content) ? (node.content as unknown[]) : [];
    const text = inline.map((c) => (isRecord(c) && typeof c.text === "string" ? c.text : "")).join("").trim();
    out.push({ index, level: Math.min(4, Math.max(1, Number(node.attrs?.level ?? 1))), number, text });
  });
  return out;
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}
