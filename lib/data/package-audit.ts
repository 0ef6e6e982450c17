import { db, type DbOrTrx } from "@/db/knex";

export type PackageAuditRow = {
  id: string;
  action: string;
  entityType: string;
  entityId: string | null;
  actorName: string | null;
  data: Record<string, unknown>;
  at: Date;
};

export type ListPackageAuditOptions = { firmId: string; projectId: string; packageId: string; limit?: number };

/**
 * The audit entries about one package, newest first: the package's own rows
 * and every row whose data names it (remarks, check marks, revisions, exports).
 * Scoped by firm and project, so a package id from elsewhere finds nothing.
 */
export async function listPackageAudit({ firmId, projectId, packageId, limit = 500 }: ListPackageAuditOptions, trx: DbOrTrx = db()): Promise<PackageAuditRow[]> {
  const rows = await trx
    .from("auditLog as a")
    .leftJoin("users as u", "u.id", "a.actorId")
    .where("a.firmId", firmId)
    .andWhere("a.projectId", projectId)
    .andWhere((q) => q.where({ "a.entityType": "package", "a.entityId": packageId }).orWhereRaw("a.data->>'packageId' = ?", [packageId]))
    .orderBy([{ column: "a.at", order: "desc" }, { column: "a.id", order: "desc" }])
    .limit(limit)
    .select("a.id", "a.action", "a.entityType", "a.entityId", "u.name as actorName", "a.data", "a.at");
  return rows as PackageAuditRow[];
}
