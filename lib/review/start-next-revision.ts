import type { Trx } from "@/db/knex";
import { AppError } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import type { ActingUser } from "@/lib/data/users";
import { loadReviewPackage } from "./load-review-package";
import { withTransaction } from "./with-transaction";

export type StartNextRevisionOptions = { actor: ActingUser; packageId: string; trx?: Trx };

/**
 * Issued → draft, keeping the document, so work continues on the next
 * revision; the issued one stays frozen in `revisions`. Check marks are kept:
 * each still holds only while its calc's inputs are unchanged, so only the
 * calcs the new revision changes need checking again.
 */
export async function startNextRevision({ actor, packageId, trx }: StartNextRevisionOptions): Promise<{ status: "draft" }> {
  return withTransaction(trx, async (t) => {
    const { pkg } = await loadReviewPackage({ actor, packageId, permission: "package.edit", refusal: "Only an engineer or the project engineer starts the next revision.", trx: t });
    if (pkg.status !== "issued") throw new AppError("CONFLICT", `Only an issued package starts a next revision; this one is ${pkg.status.replace("_", " ")}.`);
    await t.from("packages").where({ id: pkg.id }).update({ status: "draft", updatedAt: t.fn.now() });
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "revision.start_next", entityType: "package", entityId: pkg.id, projectId: pkg.projectId, data: {} }, t);
    return { status: "draft" };
  });
}
