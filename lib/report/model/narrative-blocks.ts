import type { BlockNode, PackageDocument, StandardReferenceNode, TableCellNode } from "../../document/document-types";
import { headingNumbers } from "../../document/heading-numbers";
import type { ReportBlock, ReportCalc, ReportRun } from "../report-model";
import { headingAnchor } from "./heading-anchor";
import { inlineRuns, inlineText } from "./inline-runs";

export type NarrativeOptions = {
  /** The ReportCalc of a calc node by its id (null drops the node, e.g. a calc the evaluation did not see). */
  calc: (id: string) => ReportCalc | null;
  /** Figure images already fetched by the caller, as data: URIs by the node's src. */
  figureImages?: Record<string, string>;
};

/** The document's blocks in order as report blocks; top-level headings numbered as in the editor. */
export function narrativeBlocks(document: PackageDocument, options: NarrativeOptions): ReportBlock[] {
  const numbers = headingNumbers(document);
  const out: ReportBlock[] = [];
  (document.content ?? []).forEach((node, index) => {
    if (node.type === "heading") {
      const number = numbers.get(index) ?? "";
      const text = inlineText(node.content);
      out.push({ type: "heading", level: node.attrs.level, number, text, anchor: headingAnchor(number, text) });
      return;
    }
    const block = convert(node, options);
    if (block) out.push(block);
  });
  return out;
}

function convert(node: BlockNode, options: NarrativeOptions): ReportBlock | null {
  switch (node.type) {
    case "paragraph":
      return { type: "paragraph", runs: inlineRuns(node.content) };
    case "heading":
      // Headings inside lists or cells are not numbered (the editor numbers top-level ones only).
      return { type: "paragraph", runs: [{ type: "text", text: inlineText(node.content), bold: true }] };
    case "bulletList":
    case "orderedList":
      return {
        type: "list",
        ordered: node.type === "orderedList",
        start: node.type === "orderedList" ? (node.attrs?.start ?? 1) : 1,
        items: node.content.map((item) => children(item.content, options)),
      };
    case "blockquote":
      return { type: "quote", blocks: children(node.content, options) };
    case "horizontalRule":
      return { type: "rule" };
    case "pageBreak":
      return { type: "pageBreak" };
    case "figure": {
      const src = node.attrs.src;
      const dataUri = src ? (options.figureImages?.[src] ?? null) : null;
      return { type: "figure", image: dataUri ? { dataUri } : null, caption: node.attrs.caption || null, alt: node.attrs.alt || null };
    }
    case "table": {
      const rows = node.content.map((row) => row.content);
      const first = rows[0];
      const headed = first !== undefined && first.length > 0 && first.every((c) => c.type === "tableHeader");
      const cells = (row: TableCellNode[]) => row.map(cellRuns);
      return { type: "table", header: headed ? cells(first) : null, rows: (headed ? rows.slice(1) : rows).map(cells) };
    }
    default:
      return options.calc(node.attrs.id) ? { type: "calc", calc: options.calc(node.attrs.id) as ReportCalc } : null;
  }
}

function children(nodes: BlockNode[], options: NarrativeOptions): ReportBlock[] {
  return nodes.map((n) => convert(n, options)).filter((b): b is ReportBlock => b !== null);
}

/** A cell's paragraphs flattened to runs, one line each. */
function cellRuns(cell: TableCellNode): ReportRun[] {
  const out: ReportRun[] = [];
  cell.content.forEach((block, i) => {
    if (i > 0) out.push({ type: "break" });
    if (block.type === "paragraph" || block.type === "heading") out.push(...inlineRuns(block.content));
  });
  return out;
}

/** Every standard reference in the document, in order (for the design criteria). */
export function standardReferences(document: PackageDocument): StandardReferenceNode["attrs"][] {
  const found: StandardReferenceNode["attrs"][] = [];
  const walk = (value: unknown): void => {
    if (Array.isArray(value)) value.forEach(walk);
    else if (value && typeof value === "object") {
      const node = value as { type?: unknown; attrs?: unknown; content?: unknown };
      if (node.type === "standardReference" && node.attrs) found.push(node.attrs as StandardReferenceNode["attrs"]);
      if (node.content) walk(node.content);
    }
  };
  walk(document.content);
  return found;
}
