import type { Trx } from "@/db/knex";
import { AppError, notFound } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import { findPackageComment, listPackageComments, updateCommentRow, type CommentPatch, type PlanReviewComment } from "@/lib/data/plan-review-comments";
import { isUuid } from "@/lib/data/projects";
import type { ActingUser } from "@/lib/data/users";
import { withTransaction } from "@/lib/review/with-transaction";
import { updateCommentInput } from "@/lib/validation/plan-review-input";
import { loadEditableComment } from "./load-editable-comment";
import { parseInput } from "./parse-input";
import { resolveAnsweredIn } from "./resolve-answered-in";

export type UpdateCommentOptions = { actor: ActingUser; packageId: string; commentId: string; input: unknown; trx?: Trx };

/** The project engineer writes the response and links where the draft answers it; the comment's own fields may be corrected too. */
export async function updateComment({ actor, packageId, commentId, input, trx }: UpdateCommentOptions): Promise<PlanReviewComment> {
  const body = parseInput(updateCommentInput, input);
  if (!isUuid(commentId)) throw notFound("Plan-review comment");
  return withTransaction(trx, async (t) => {
    const { pkg, comment } = await loadEditableComment({ actor, packageId, commentId, trx: t });
    const patch: CommentPatch = {};
    if (body.number !== undefined && body.number !== comment.number) {
      const others = await listPackageComments(pkg.id, t, { revisionId: comment.revisionId });
      if (others.some((c) => c.id !== comment.id && c.number.toLowerCase() === body.number?.toLowerCase())) {
        throw new AppError("INVALID", `Comment ${body.number} is already recorded on Rev ${comment.revisionLabel}.`, "number");
      }
      patch.number = body.number;
    }
    if (body.text !== undefined) patch.text = body.text;
    if (body.reviewer !== undefined) patch.reviewer = body.reviewer?.trim() || null;
    if (body.receivedOn !== undefined) patch.receivedOn = body.receivedOn ?? null;
    if (body.response !== undefined) patch.response = body.response.trim();
    if (body.answeredIn !== undefined) patch.answeredIn = resolveAnsweredIn(body.answeredIn, pkg.document);
    await updateCommentRow(comment.id, patch, t);
    await recordAudit(
      { firmId: actor.firmId, actorId: actor.id, action: "plan_review.update", entityType: "plan_review_comment", entityId: comment.id, projectId: pkg.projectId, data: { packageId: pkg.id, number: patch.number ?? comment.number, fields: Object.keys(patch) } },
      t,
    );
    const updated = await findPackageComment(pkg.id, comment.id, t);
    if (!updated) throw notFound("Plan-review comment");
    return updated;
  });
}
