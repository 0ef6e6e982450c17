import { db } from "@/db/knex";
import { notFound } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import { insertExport, updateExport, type ExportFormat, type ExportRow } from "@/lib/data/exports";
import type { ProjectAccess } from "@/lib/data/projects";
import type { ActingUser } from "@/lib/data/users";
import { sendJob } from "@/lib/jobs/send-job";
import { newVerifyToken } from "./verify-token";

export type CreateExportOptions = { actor: ActingUser; access: ProjectAccess; packageId: string; format: ExportFormat; revisionId?: string | null };

/**
 * Queues an export of the draft or of one issued revision. A PDF of an issued
 * revision is signed and gets its verification token now, before rendering,
 * because the cover prints the verification link and QR code.
 */
export async function createExport({ actor, access, packageId, format, revisionId = null }: CreateExportOptions): Promise<ExportRow> {
  const row = await db().transaction(async (t) => {
    if (revisionId) {
      const revision = await t.from("revisions").select("id").where({ id: revisionId, packageId }).first();
      if (!revision) throw notFound("Revision");
    }
    const verifyToken = format === "pdf" && revisionId ? newVerifyToken() : null;
    const created = await insertExport({ firmId: actor.firmId, projectId: access.project.id, packageId, revisionId, format, requestedBy: actor.id, verifyToken }, t);
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "export.create", entityType: "export", entityId: created.id, projectId: access.project.id, data: { packageId, revisionId, format } }, t);
    return created;
  });
  // After commit: the worker must find the row the job names. A row whose job never queued says so rather than waiting.
  try {
    await sendJob("export.render", { exportId: row.id });
  } catch (error) {
    await updateExport(row.id, { status: "failed", error: "The export could not be queued; try again.", finishedAt: new Date() });
    throw error;
  }
  return row;
}
