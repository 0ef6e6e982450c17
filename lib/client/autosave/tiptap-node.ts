import { z } from "zod";

/** A mark on a text node (bold, link …), as TipTap's `getJSON()` writes it. */
export type TipTapMark = { type: string; attrs?: Record<string, unknown> };

/**
 * One node of a TipTap document in its JSON form. The autosave layer never
 * interprets node types: the server validates them against the schema. It only
 * needs the shape, to compare, merge and keep documents. `type` is optional
 * only so TipTap's own `JSONContent` (from `editor.getJSON()`) fits as it is.
 */
export type TipTapNode = {
  type?: string;
  attrs?: Record<string, unknown>;
  content?: TipTapNode[];
  marks?: TipTapMark[];
  text?: string;
};

const markSchema = z.object({ type: z.string(), attrs: z.record(z.string(), z.unknown()).optional() });

/** The shape check for documents that come back from storage or from a 409 body. */
export const tipTapNodeSchema: z.ZodType<TipTapNode> = z.lazy(() =>
  z.object({
    type: z.string(),
    attrs: z.record(z.string(), z.unknown()).optional(),
    content: z.array(tipTapNodeSchema).optional(),
    marks: z.array(markSchema).optional(),
    text: z.string().optional(),
  }),
);
