import type { Trx } from "@/db/knex";
import { can } from "@/lib/access/permissions";
import { AppError } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import { isUuid } from "@/lib/data/projects";
import type { ActingUser } from "@/lib/data/users";
import { loadRemark } from "./load-remark";
import { loadReviewPackage } from "./load-review-package";
import { settlePackageState } from "./settle-package-state";
import { withTransaction } from "./with-transaction";

export type CloseRemarkOptions = { actor: ActingUser; packageId: string; remarkId: string; trx?: Trx };

/**
 * Closes a remark: only the person who opened it, or the project engineer.
 * An author cannot close a checker's remark, or checking would mean nothing.
 * Closing the last open remark can make the package checked.
 */
export async function closeRemark({ actor, packageId, remarkId, trx }: CloseRemarkOptions): Promise<{ status: string }> {
  return withTransaction(trx, async (t) => {
    const { access, pkg } = await loadReviewPackage({ actor, packageId, permission: "remark.create", refusal: "You cannot close remarks on this package.", trx: t });
    if (!isUuid(remarkId)) throw new AppError("NOT_FOUND", "Remark not found.");
    const remark = await loadRemark({ packageId: pkg.id, remarkId, trx: t });
    // The engineer of record is whoever the permission table lets issue revisions on this project.
    const isEngineerOfRecord = can("revision.issue", access.grantees);
    if (remark.openedBy !== actor.id && !isEngineerOfRecord) {
      throw new AppError("FORBIDDEN", `Only ${remark.openerName}, who raised this remark, or the project engineer can close it; reply to it instead.`);
    }
    if (remark.state === "closed") throw new AppError("CONFLICT", "This remark is already closed.");
    await t.from("remarks").where({ id: remark.id }).update({ state: "closed", closedBy: actor.id, closedAt: t.fn.now() });
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "remark.close", entityType: "remark", entityId: remark.id, projectId: pkg.projectId, data: { packageId: pkg.id, from: remark.state } }, t);
    return { status: await settlePackageState({ actor, pkg, trx: t }) };
  });
}
