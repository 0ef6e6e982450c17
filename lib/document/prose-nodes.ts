import type { BlockNode, HeadingNode, InlineNode, ParagraphNode, StandardReferenceNode, TableCellNode, TableNode, TextMark, TextNode } from "./document-types";

/**
 * Small builders for narrative nodes, so fixtures and seeds read like the
 * document they produce rather than like JSON.
 */

/** A run of text, optionally marked. */
export function text(value: string, ...marks: TextMark["type"][]): TextNode {
  const plain = marks.filter((m): m is Exclude<TextMark["type"], "link"> => m !== "link");
  return plain.length ? { type: "text", text: value, marks: plain.map((type) => ({ type })) } : { type: "text", text: value };
}

/** A paragraph; strings become plain text. */
export function paragraph(...parts: (string | InlineNode)[]): ParagraphNode {
  return { type: "paragraph", content: parts.map((p) => (typeof p === "string" ? text(p) : p)) };
}

/** A heading of level 1–4. */
export function heading(level: 1 | 2 | 3 | 4, title: string): HeadingNode {
  return { type: "heading", attrs: { level }, content: [text(title)] };
}

/** A reference to a code or standard clause. */
export function standardRef(code: string, edition: string, clause: string): StandardReferenceNode {
  return { type: "standardReference", attrs: { code, edition, clause } };
}

/** A bullet list of paragraphs. */
export function bullets(...items: (string | InlineNode)[][]): BlockNode {
  return { type: "bulletList", content: items.map((parts) => ({ type: "listItem", content: [paragraph(...parts)] })) };
}

/** A table whose first row is the header row. */
export function table(header: string[], rows: (string | InlineNode)[][][]): TableNode {
  const cell = (type: TableCellNode["type"], parts: (string | InlineNode)[]): TableCellNode => ({ type, attrs: { colspan: 1, rowspan: 1, colwidth: null }, content: [paragraph(...parts)] });
  return {
    type: "table",
    content: [
      { type: "tableRow", content: header.map((h) => cell("tableHeader", [h])) },
      ...rows.map((r) => ({ type: "tableRow" as const, content: r.map((parts) => cell("tableCell", parts)) })),
    ],
  };
}
