import type { Trx } from "@/db/knex";
import { listPackageComments, type PlanReviewComment, type RevisionRef } from "@/lib/data/plan-review-comments";
import type { ActingUser } from "@/lib/data/users";
import { withTransaction } from "@/lib/review/with-transaction";
import { loadPlanReviewPackage } from "./load-plan-review-package";

export type ListedComment = PlanReviewComment & {
  /** On the latest issued revision, with the answering draft not issued yet. */
  editable: boolean;
};

export type CommentList = {
  /** The revision the current draft answers (the latest issued), or null before Rev 0. */
  answers: RevisionRef | null;
  /** Issued revisions, newest first. */
  revisions: RevisionRef[];
  comments: ListedComment[];
};

export type ListCommentsOptions = { actor: ActingUser; packageId: string; trx?: Trx };

/** Every plan-review comment of the package, oldest revision first, in the office's order; every project member reads them. */
export async function listComments({ actor, packageId, trx }: ListCommentsOptions): Promise<CommentList> {
  return withTransaction(trx, async (t) => {
    const { pkg, answers, revisions } = await loadPlanReviewPackage({ actor, packageId, write: false, trx: t });
    const comments = await listPackageComments(pkg.id, t);
    const open = pkg.status !== "issued";
    return { answers, revisions, comments: comments.map((c) => ({ ...c, editable: open && answers !== null && c.revisionId === answers.id })) };
  });
}
