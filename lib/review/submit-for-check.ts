import type { Trx } from "@/db/knex";
import { AppError } from "@/lib/app-error";
import { notifyAfterCommit } from "@/lib/notifications/notify-review";
import { recordAudit } from "@/lib/data/audit";
import type { ActingUser } from "@/lib/data/users";
import { loadReviewPackage } from "./load-review-package";
import { withTransaction } from "./with-transaction";

export type SubmitForCheckOptions = { actor: ActingUser; packageId: string; trx?: Trx };

const whyNot: Record<string, string> = {
  in_check: "This package is already in check.",
  checked: "This package is already checked; the project engineer can issue it.",
  issued: "This package is issued; start the next revision to change and resubmit it.",
};

/** Draft → in check. Needs an assigned checker, who is told by e-mail once this commits. */
export async function submitForCheck({ actor, packageId, trx }: SubmitForCheckOptions): Promise<{ status: "in_check"; assignedChecker: string }> {
  return withTransaction(trx, async (t) => {
    const { pkg } = await loadReviewPackage({ actor, packageId, permission: "package.submit", refusal: "Only an engineer or the project engineer submits a package for check.", trx: t });
    if (pkg.status !== "draft") throw new AppError("CONFLICT", whyNot[pkg.status]);
    if (!pkg.assignedChecker) throw new AppError("CONFLICT", "No checker is assigned to this package; the project engineer must assign one before it can be submitted for check.");
    await t.from("packages").where({ id: pkg.id }).update({ status: "in_check", updatedAt: t.fn.now() });
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "package.submit", entityType: "package", entityId: pkg.id, projectId: pkg.projectId, data: { checkerId: pkg.assignedChecker } }, t);
    notifyAfterCommit(t, { kind: "submitted", packageId: pkg.id, actorId: actor.id });
    return { status: "in_check", assignedChecker: pkg.assignedChecker };
  });
}
