import { db } from "@/db/knex";
import { recordAudit } from "@/lib/data/audit";
import { createPackage as insertPackage, type PackageSummary } from "@/lib/data/packages";
import type { ActingUser } from "@/lib/data/users";

export type CreatePackageOptions = { actor: ActingUser; projectId: string; title: string };

export async function createPackage({ actor, projectId, title }: CreatePackageOptions): Promise<PackageSummary> {
  return db().transaction(async (trx) => {
    const pkg = await insertPackage({ projectId, title, createdBy: actor.id }, trx);
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "package.create", entityType: "package", entityId: pkg.id, projectId, data: { title } }, trx);
    return pkg;
  });
}
