import { db } from "@/db/knex";
import { AppError, notFound } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import { deletePackage as removePackage, findPackage } from "@/lib/data/packages";
import type { ActingUser } from "@/lib/data/users";

export type DeletePackageOptions = { actor: ActingUser; projectId: string; packageId: string };

/** Only a draft may be deleted: once submitted for check, a package is part of the record. */
export async function deletePackage({ actor, projectId, packageId }: DeletePackageOptions): Promise<void> {
  await db().transaction(async (trx) => {
    const pkg = await findPackage(projectId, packageId, {}, trx);
    if (!pkg) throw notFound("Package");
    if (pkg.status !== "draft") {
      throw new AppError("CONFLICT", `Only a draft package can be deleted; this one is ${pkg.status.replace("_", " ")}.`);
    }
    // A draft that follows an issued revision is part of the record too: its revisions must stay.
    const issued = await trx.from("revisions").where({ packageId }).first("id");
    if (issued) throw new AppError("CONFLICT", "This package has issued revisions and cannot be deleted; its next draft can be edited instead.");
    await removePackage(packageId, trx);
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "package.delete", entityType: "package", entityId: packageId, projectId, data: { title: pkg.title } }, trx);
  });
}
