import type { Trx } from "@/db/knex";
import { notFound } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import { deleteCommentRow } from "@/lib/data/plan-review-comments";
import { isUuid } from "@/lib/data/projects";
import type { ActingUser } from "@/lib/data/users";
import { withTransaction } from "@/lib/review/with-transaction";
import { loadEditableComment } from "./load-editable-comment";

export type DeleteCommentOptions = { actor: ActingUser; packageId: string; commentId: string; trx?: Trx };

/** Removes a comment recorded by mistake; the audit log keeps its number and text. */
export async function deleteComment({ actor, packageId, commentId, trx }: DeleteCommentOptions): Promise<void> {
  if (!isUuid(commentId)) throw notFound("Plan-review comment");
  await withTransaction(trx, async (t) => {
    const { pkg, comment } = await loadEditableComment({ actor, packageId, commentId, trx: t });
    await deleteCommentRow(comment.id, t);
    await recordAudit(
      { firmId: actor.firmId, actorId: actor.id, action: "plan_review.delete", entityType: "plan_review_comment", entityId: comment.id, projectId: pkg.projectId, data: { packageId: pkg.id, revision: comment.revisionLabel, number: comment.number, text: comment.text } },
      t,
    );
  });
}
