import { z } from "zod";
import { calcKinds } from "../calcs/calc-types";
import { calcNodeSchema } from "./calc-node-schemas";
import type { BlockNode, ListItemNode, TableCellNode } from "./document-types";
import { inlineNodeSchema } from "./inline-node-schemas";

/**
 * Where a figure's image may come from: a key in the package's file store
 * (`firms/…/figure.png`) or a path of our own API (`/api/v1/files/…`). Never
 * a URL with a scheme, so no `javascript:` or `data:` and no other site.
 */
const FIGURE_SRC = /^(?:\/api\/[A-Za-z0-9._~\/-]+(?:\?[A-Za-z0-9._~=&%-]*)?|[A-Za-z0-9][A-Za-z0-9._~!*'()\/-]*)$/;
const figureSrc = z
  .string()
  .max(1024)
  .regex(FIGURE_SRC, "must be a file-store key or an /api/ path")
  .refine((s) => !s.includes("..") && !s.includes("//") && !/^[A-Za-z][A-Za-z0-9+.-]*:/.test(s), "must be a file-store key or an /api/ path");

const blocks = () => z.array(z.lazy(() => blockNodeSchema));
const inline = z.array(inlineNodeSchema).optional();

const paragraph = z.strictObject({ type: z.literal("paragraph"), content: inline });
const heading = z.strictObject({ type: z.literal("heading"), attrs: z.strictObject({ level: z.literal([1, 2, 3, 4]) }), content: inline });
const listItem: z.ZodType<ListItemNode> = z.strictObject({ type: z.literal("listItem"), content: blocks().min(1) });
const bulletList = z.strictObject({ type: z.literal("bulletList"), content: z.array(listItem).min(1) });
const orderedList = z.strictObject({
  type: z.literal("orderedList"),
  attrs: z.strictObject({ start: z.number().int().min(0).max(100000).optional(), type: z.enum(["1", "a", "A", "i", "I"]).nullable().optional() }).optional(),
  content: z.array(listItem).min(1),
});
const blockquote = z.strictObject({ type: z.literal("blockquote"), content: blocks().min(1) });
const horizontalRule = z.strictObject({ type: z.literal("horizontalRule") });
const pageBreak = z.strictObject({ type: z.literal("pageBreak") });
const figure = z.strictObject({
  type: z.literal("figure"),
  attrs: z.strictObject({ src: figureSrc.nullable(), caption: z.string().max(2000).optional(), alt: z.string().max(1000).optional() }),
});
const cellAttrs = z
  .strictObject({
    colspan: z.number().int().min(1).max(100).optional(),
    rowspan: z.number().int().min(1).max(1000).optional(),
    colwidth: z.array(z.number().int().min(0).max(10000)).max(100).nullable().optional(),
    // The table extension records each cell's text alignment.
    align: z.enum(["left", "center", "right"]).nullable().optional(),
  })
  .optional();
const cell = (type: "tableCell" | "tableHeader") => z.strictObject({ type: z.literal(type), attrs: cellAttrs, content: blocks().min(1) });
const tableCell: z.ZodType<TableCellNode> = z.discriminatedUnion("type", [cell("tableCell"), cell("tableHeader")]);
const tableRow = z.strictObject({ type: z.literal("tableRow"), content: z.array(tableCell).min(1) });
const table = z.strictObject({ type: z.literal("table"), content: z.array(tableRow).min(1) });

const calcNodes = calcKinds.map((kind) => calcNodeSchema(kind));

/** Every node that may stand as a block: narrative nodes and the seven calc nodes. */
export const blockNodeSchema: z.ZodType<BlockNode> = z.discriminatedUnion("type", [
  paragraph,
  heading,
  bulletList,
  orderedList,
  blockquote,
  horizontalRule,
  pageBreak,
  figure,
  table,
  calcNodes[0],
  calcNodes[1],
  calcNodes[2],
  calcNodes[3],
  calcNodes[4],
  calcNodes[5],
  calcNodes[6],
]);

/** The document node. */
export const docNodeSchema = z.strictObject({ type: z.literal("doc"), content: z.array(blockNodeSchema).optional() });
