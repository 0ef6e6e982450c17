import { z } from "zod";

export const planReviewParams = z.object({ packageId: z.uuid() });
export const planReviewCommentParams = z.object({ packageId: z.uuid(), commentId: z.uuid() });

const number = z.string().trim().min(1, "Give the comment's number as the permit office wrote it.").max(20, "Use at most 20 characters for the number.");
const commentText = z.string().trim().min(1, "Write the comment's text.").max(10_000, "Use at most 10,000 characters.");
const reviewer = z.string().trim().max(200, "Use at most 200 characters for the reviewer.").nullish();
const receivedOn = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Give the date as YYYY-MM-DD.")
  .refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s), "This is not a calendar date.")
  .nullish();

/**
 * Recording comments on an issued revision: either a pasted block, split into
 * one comment per number, or one comment with its number and text.
 */
export const recordCommentsInput = z
  .strictObject({
    revisionId: z.uuid("Choose the issued revision the permit office reviewed."),
    reviewer,
    receivedOn,
    paste: z.string().max(100_000, "Paste at most 100,000 characters.").optional(),
    number: number.optional(),
    text: commentText.optional(),
  })
  .superRefine((v, ctx) => {
    if (v.paste !== undefined) {
      if (v.number !== undefined || v.text !== undefined) ctx.addIssue({ code: "custom", path: ["paste"], message: "Give either a pasted list or one comment's number and text, not both." });
      else if (!v.paste.trim()) ctx.addIssue({ code: "custom", path: ["paste"], message: "Paste the comments as a numbered list." });
      return;
    }
    if (v.number === undefined) ctx.addIssue({ code: "custom", path: ["number"], message: "Give the comment's number, or paste a numbered list." });
    if (v.text === undefined) ctx.addIssue({ code: "custom", path: ["text"], message: "Write the comment's text, or paste a numbered list." });
  });
export type RecordCommentsInput = z.output<typeof recordCommentsInput>;

/** Where the draft answers a comment: a calc by id, or a top-level heading by its position (its text guards against a stale position). */
export const answeredInLink = z.discriminatedUnion("type", [
  z.strictObject({ type: z.literal("calc"), calcId: z.string().min(1, "Choose a calc.").max(200), label: z.string().max(50).optional() }),
  z.strictObject({ type: z.literal("heading"), index: z.number().int().min(0), text: z.string().max(1_000).optional() }),
]);
export type AnsweredInLinkInput = z.output<typeof answeredInLink>;

export const updateCommentInput = z
  .strictObject({
    number: number.optional(),
    text: commentText.optional(),
    reviewer,
    receivedOn,
    response: z.string().max(20_000, "Use at most 20,000 characters for the response.").optional(),
    answeredIn: z.array(answeredInLink).max(50, "Link at most 50 places.").optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: "Change at least one field.", path: ["response"] });
export type UpdateCommentInput = z.output<typeof updateCommentInput>;
