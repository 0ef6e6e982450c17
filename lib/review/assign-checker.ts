import type { Trx } from "@/db/knex";
import { AppError } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import type { ActingUser } from "@/lib/data/users";
import { loadReviewPackage } from "./load-review-package";
import { withTransaction } from "./with-transaction";

export type AssignCheckerOptions = { actor: ActingUser; packageId: string; checkerId: string; trx?: Trx };

/** The project engineer names the package's checker: a member of the project in the checker role. */
export async function assignChecker({ actor, packageId, checkerId, trx }: AssignCheckerOptions): Promise<void> {
  await withTransaction(trx, async (t) => {
    const { pkg } = await loadReviewPackage({ actor, packageId, permission: "checker.assign", refusal: "Only the project engineer assigns the checker.", trx: t });
    if (pkg.status === "issued") throw new AppError("CONFLICT", "This package is issued; start the next revision before assigning a checker.");
    const member = await t.from("projectMemberships").select("role").where({ projectId: pkg.projectId, userId: checkerId }).first();
    if (member?.role !== "checker") throw new AppError("INVALID", "The checker must be a member of this project with the checker role.", "checkerId");
    await t.from("packages").where({ id: pkg.id }).update({ assignedChecker: checkerId, updatedAt: t.fn.now() });
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "checker.assign", entityType: "package", entityId: pkg.id, projectId: pkg.projectId, data: { checkerId } }, t);
  });
}
