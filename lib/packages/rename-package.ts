import { db } from "@/db/knex";
import { AppError, notFound } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import { findPackage, renamePackage as updateTitle, type PackageSummary } from "@/lib/data/packages";
import type { ActingUser } from "@/lib/data/users";

export type RenamePackageOptions = { actor: ActingUser; projectId: string; packageId: string; title: string };

export async function renamePackage({ actor, projectId, packageId, title }: RenamePackageOptions): Promise<PackageSummary> {
  return db().transaction(async (trx) => {
    const pkg = await findPackage(projectId, packageId, {}, trx);
    if (!pkg) throw notFound("Package");
    if (pkg.status === "issued") throw new AppError("CONFLICT", "An issued package keeps its title; start the next revision to change it.");
    const renamed = await updateTitle(packageId, title, trx);
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "package.rename", entityType: "package", entityId: packageId, projectId, data: { from: pkg.title, to: title } }, trx);
    return renamed;
  });
}
