import { db, type DbOrTrx } from "@/db/knex";

export type AuditEntry = {
  firmId: string;
  actorId: string | null;
  action: string;
  entityType: string;
  entityId?: string | null;
  projectId?: string | null;
  data?: Record<string, unknown>;
};

/** Appends to the audit log; the table itself refuses updates and deletes. */
export async function recordAudit(entry: AuditEntry, trx: DbOrTrx = db()): Promise<void> {
  await trx.insert({ ...entry, data: JSON.stringify(entry.data ?? {}) }).into("auditLog");
}
