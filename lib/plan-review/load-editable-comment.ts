import type { Trx } from "@/db/knex";
import { AppError, notFound } from "@/lib/app-error";
import { findPackageComment, type PlanReviewComment } from "@/lib/data/plan-review-comments";
import type { ActingUser } from "@/lib/data/users";
import type { ReviewPackage } from "@/lib/review/load-review-package";
import { loadPlanReviewPackage } from "./load-plan-review-package";

export type LoadEditableCommentOptions = { actor: ActingUser; packageId: string; commentId: string; trx: Trx };

/**
 * A comment the project engineer may still change: on the latest issued
 * revision, while its answering draft is not issued. Once the next revision is
 * issued the comment is part of that revision's frozen response letter.
 */
export async function loadEditableComment({ actor, packageId, commentId, trx }: LoadEditableCommentOptions): Promise<{ pkg: ReviewPackage; comment: PlanReviewComment }> {
  const { pkg, answers } = await loadPlanReviewPackage({ actor, packageId, write: true, trx });
  const comment = await findPackageComment(pkg.id, commentId, trx);
  if (!comment) throw notFound("Plan-review comment");
  if (!answers || comment.revisionId !== answers.id) {
    throw new AppError("CONFLICT", `Comment ${comment.number} on Rev ${comment.revisionLabel} was answered in a later revision; its response letter is frozen.`);
  }
  return { pkg, comment };
}
