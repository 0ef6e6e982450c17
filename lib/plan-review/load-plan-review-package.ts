import type { Trx } from "@/db/knex";
import { AppError } from "@/lib/app-error";
import { listRevisionRefs, type RevisionRef } from "@/lib/data/plan-review-comments";
import type { ActingUser } from "@/lib/data/users";
import { loadReviewPackage, type ReviewPackage } from "@/lib/review/load-review-package";

export type PlanReviewPackage = {
  pkg: ReviewPackage;
  /** The latest issued revision: the one whose comments the current draft answers; null before Rev 0. */
  answers: RevisionRef | null;
  revisions: RevisionRef[];
};

export type LoadPlanReviewPackageOptions = { actor: ActingUser; packageId: string; write: boolean; trx: Trx };

const refusal = "Only the project engineer records and answers plan-review comments.";

/**
 * The package scoped to the actor, with the revision its draft answers. For a
 * write the package row is locked (so a comment cannot change while the next
 * revision is being issued) and the package must not be issued: comments are
 * answered in the draft that follows the reviewed revision.
 */
export async function loadPlanReviewPackage({ actor, packageId, write, trx }: LoadPlanReviewPackageOptions): Promise<PlanReviewPackage> {
  const { pkg } = write
    ? await loadReviewPackage({ actor, packageId, permission: "planReview.manage", refusal, trx })
    : await loadReviewPackage({ actor, packageId, permission: "planReview.read", refusal: "You cannot read this package.", lock: false, trx });
  if (write && pkg.status === "issued") {
    throw new AppError("CONFLICT", "This package is issued and cannot change; start the next revision, then record and answer the comments there.");
  }
  const revisions = await listRevisionRefs(pkg.id, trx);
  return { pkg, answers: revisions[0] ?? null, revisions };
}
