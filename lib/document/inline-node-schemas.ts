import { z } from "zod";
import { MAX_TEXT_LENGTH } from "./document-limits";
import type { InlineNode } from "./document-types";

/** Link targets an author may write: web pages and e-mail addresses; never script or data URLs. */
const SAFE_HREF = /^(?:https?:\/\/[^\s<>"']+|mailto:[^\s<>"']+)$/i;

const linkMark = z.strictObject({
  type: z.literal("link"),
  attrs: z.strictObject({
    href: z.string().max(2000).regex(SAFE_HREF, "must be an http(s) or mailto link"),
    target: z.string().max(20).nullable().optional(),
    rel: z.string().max(100).nullable().optional(),
    class: z.string().max(100).nullable().optional(),
    title: z.string().max(500).nullable().optional(),
  }),
});

const plainMark = (type: "bold" | "italic" | "code" | "subscript" | "superscript") => z.strictObject({ type: z.literal(type) });

/** Marks a text node may carry. */
export const markSchema = z.discriminatedUnion("type", [
  plainMark("bold"),
  plainMark("italic"),
  plainMark("code"),
  plainMark("subscript"),
  plainMark("superscript"),
  linkMark,
]);

const textNode = z.strictObject({
  type: z.literal("text"),
  text: z.string().min(1).max(MAX_TEXT_LENGTH),
  marks: z.array(markSchema).max(6).optional(),
});

const hardBreakNode = z.strictObject({ type: z.literal("hardBreak") });

/** A code or standard reference; fields may be empty while the author fills them in. */
export const standardReferenceNode = z.strictObject({
  type: z.literal("standardReference"),
  attrs: z.strictObject({ code: z.string().max(80), edition: z.string().max(40), clause: z.string().max(80) }),
});

/** What a paragraph or heading may hold. */
export const inlineNodeSchema: z.ZodType<InlineNode> = z.discriminatedUnion("type", [textNode, hardBreakNode, standardReferenceNode]);
