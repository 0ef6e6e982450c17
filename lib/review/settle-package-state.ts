import type { Trx } from "@/db/knex";
import { recordAudit } from "@/lib/data/audit";
import { notifyAfterCommit } from "@/lib/notifications/notify-review";
import type { PackageStatus } from "@/lib/data/packages";
import type { ActingUser } from "@/lib/data/users";
import { computeCheckProgress } from "./compute-check-progress";
import type { ReviewPackage } from "./load-review-package";

export type SettlePackageStateOptions = { actor: ActingUser; pkg: ReviewPackage; trx: Trx };

/**
 * The automatic moves between "in check" and "checked": a package in check
 * becomes checked when every calc is checked and no remark is open, and a
 * checked package falls back to in check when a remark is raised or a calc's
 * inputs change. Call it, in the same transaction, after any change that can
 * affect progress (a mark, a remark, a document save). Draft and issued stay.
 */
export async function settlePackageState({ actor, pkg, trx }: SettlePackageStateOptions): Promise<PackageStatus> {
  if (pkg.status !== "in_check" && pkg.status !== "checked") return pkg.status;
  const progress = await computeCheckProgress({ packageId: pkg.id, document: pkg.document, trx });
  const next: PackageStatus = progress.complete ? "checked" : "in_check";
  if (next === pkg.status) return next;
  await trx.from("packages").where({ id: pkg.id }).update({ status: next, updatedAt: trx.fn.now() });
  await recordAudit(
    { firmId: actor.firmId, actorId: actor.id, action: `package.${next}`, entityType: "package", entityId: pkg.id, projectId: pkg.projectId, data: { from: pkg.status, checked: progress.checked, total: progress.total, openRemarks: progress.openRemarks } },
    trx,
  );
  if (next === "checked") notifyAfterCommit(trx, { kind: "checked", packageId: pkg.id, actorId: actor.id });
  return next;
}
