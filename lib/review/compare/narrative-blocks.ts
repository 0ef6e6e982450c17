import { calcKinds } from "@/lib/calcs/calc-types";
import type { BlockKind } from "./snapshot";

/** A top-level narrative block (not a calc) with its plain text. */
export type NarrativeBlock = { index: number; kind: BlockKind; text: string };

const CALC_TYPES: ReadonlySet<string> = new Set(calcKinds);

const kindOf: Record<string, BlockKind> = {
  heading: "heading",
  paragraph: "paragraph",
  bulletList: "list",
  orderedList: "list",
  table: "table",
  blockquote: "blockquote",
  figure: "figure",
};

type Node = { type?: unknown; text?: unknown; attrs?: Record<string, unknown>; content?: unknown };

/** The document's top-level blocks other than calcs, in order, each with the text a reader sees. */
export function narrativeBlocks(document: unknown): NarrativeBlock[] {
  const content = (document as Node | null)?.content;
  if (!Array.isArray(content)) return [];
  const out: NarrativeBlock[] = [];
  content.forEach((node: Node, index) => {
    if (typeof node?.type !== "string" || CALC_TYPES.has(node.type)) return;
    out.push({ index, kind: kindOf[node.type] ?? "other", text: blockText(node) });
  });
  return out;
}

/** Plain text of a block: runs joined, clause references spelled out, list items and table rows on their own lines. */
export function blockText(node: Node): string {
  switch (node.type) {
    case "text":
      return typeof node.text === "string" ? node.text : "";
    case "hardBreak":
      return "\n";
    case "standardReference": {
      const a = node.attrs ?? {};
      return `${String(a.code ?? "")}:${String(a.edition ?? "")} ${String(a.clause ?? "")}`.trim();
    }
    case "figure":
      return `[figure] ${String(node.attrs?.caption ?? node.attrs?.alt ?? "")}`.trim();
    case "horizontalRule":
      return "—";
    case "pageBreak":
      return "[page break]";
    default:
      break;
  }
  const children = Array.isArray(node.content) ? (node.content as Node[]) : [];
  if (node.type === "bulletList" || node.type === "orderedList") return children.map((c) => `• ${blockText(c)}`).join("\n");
  if (node.type === "table") return children.map(blockText).join("\n");
  if (node.type === "tableRow") return children.map(blockText).join(" | ");
  if (node.type === "listItem" || node.type === "tableCell" || node.type === "tableHeader" || node.type === "blockquote") return children.map(blockText).join("\n");
  return children.map(blockText).join("");
}
