import type { CalcKind } from "../calcs/calc-types";

/** Marks a text node may carry. A link's href is http(s) or mailto only. */
export type TextMark =
  | { type: "bold" | "italic" | "code" | "subscript" | "superscript" }
  | { type: "link"; attrs: { href: string; target?: string | null; rel?: string | null; class?: string | null; title?: string | null } };

/** A run of text (never empty, at most 100,000 characters). */
export type TextNode = { type: "text"; text: string; marks?: TextMark[] };
/** A line break inside a paragraph. */
export type HardBreakNode = { type: "hardBreak" };
/** A code or standard clause, e.g. EN 1993-1-1:2005 §6.3.1; collected for the design criteria. */
export type StandardReferenceNode = { type: "standardReference"; attrs: { code: string; edition: string; clause: string } };
/** What a paragraph or heading holds. */
export type InlineNode = TextNode | HardBreakNode | StandardReferenceNode;

export type ParagraphNode = { type: "paragraph"; content?: InlineNode[] };
/** Headings 1–4, numbered automatically by the editor and the export. */
export type HeadingNode = { type: "heading"; attrs: { level: 1 | 2 | 3 | 4 }; content?: InlineNode[] };
export type ListItemNode = { type: "listItem"; content: BlockNode[] };
export type BulletListNode = { type: "bulletList"; content: ListItemNode[] };
export type OrderedListNode = { type: "orderedList"; attrs?: { start?: number; type?: string | null }; content: ListItemNode[] };
export type BlockquoteNode = { type: "blockquote"; content: BlockNode[] };
export type HorizontalRuleNode = { type: "horizontalRule" };
export type PageBreakNode = { type: "pageBreak" };
/** An image from the package's file store: an S3 key or an /api/ path (null until uploaded). */
export type FigureNode = { type: "figure"; attrs: { src: string | null; caption?: string; alt?: string } };
/** Cell attributes as TipTap's table writes them. */
export type CellAttrs = { colspan?: number; rowspan?: number; colwidth?: number[] | null };
export type TableCellNode = { type: "tableCell" | "tableHeader"; attrs?: CellAttrs; content: BlockNode[] };
export type TableRowNode = { type: "tableRow"; content: TableCellNode[] };
export type TableNode = { type: "table"; content: TableRowNode[] };
/** A calc: only its identity and inputs are stored; everything else is derived. */
export type CalcDocNode = { type: CalcKind; attrs: { id: string; label: string; inputs: unknown } };

/** Every node that can stand as a block. */
export type BlockNode =
  | ParagraphNode
  | HeadingNode
  | BulletListNode
  | OrderedListNode
  | BlockquoteNode
  | HorizontalRuleNode
  | PageBreakNode
  | FigureNode
  | TableNode
  | CalcDocNode;

/** A package document: TipTap/ProseMirror JSON with Panelpoint's nodes. */
export type PackageDocument = { type: "doc"; content?: BlockNode[] };
