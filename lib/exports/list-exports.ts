import { db } from "@/db/knex";
import { listPackageExports, type ExportListRow } from "@/lib/data/exports";
import { queues } from "@/lib/jobs/queues";
import { signExportLink } from "./export-link";

export type ExportDto = {
  id: string;
  format: "pdf" | "docx";
  revisionId: string | null;
  revisionLabel: string | null;
  status: "queued" | "rendering" | "done" | "failed";
  /** "Rendering sheet 3 of 41" while the PDF renders. */
  sheet: number | null;
  sheetCount: number | null;
  error: string | null;
  signed: boolean;
  byteSize: number | null;
  sha256: string | null;
  requestedBy: string | null;
  createdAt: string;
  finishedAt: string | null;
  /** A five-minute signed link, for done exports only. */
  downloadUrl: string | null;
  /** The public verification page, for signed PDFs of issued revisions. */
  verifyPath: string | null;
};

// A row still rendering well past the job's expiry lost its worker on the last attempt: say so.
const STALE_SECONDS = queues["export.render"].expireInSeconds * 2;

/** The package's exports, newest first; the caller has checked the actor may read the package. */
export async function listExports({ packageId, limit = 50 }: { packageId: string; limit?: number }): Promise<ExportDto[]> {
  await db()
    .from("exports")
    .where({ packageId, status: "rendering" })
    .andWhere("startedAt", "<", db().raw(`now() - interval '${STALE_SECONDS} seconds'`))
    .update({ status: "failed", error: "The export worker stopped while rendering; ask for the export again.", finishedAt: db().fn.now() });
  return (await listPackageExports(packageId, limit)).map(toDto);
}

function toDto(e: ExportListRow): ExportDto {
  const done = e.status === "done";
  return {
    id: e.id,
    format: e.format,
    revisionId: e.revisionId,
    revisionLabel: e.revisionLabel,
    status: e.status,
    sheet: e.sheet,
    sheetCount: e.sheetCount,
    error: e.error,
    signed: e.signed,
    byteSize: e.byteSize,
    sha256: done ? e.sha256 : null,
    requestedBy: e.requestedByName,
    createdAt: new Date(e.createdAt).toISOString(),
    finishedAt: e.finishedAt ? new Date(e.finishedAt).toISOString() : null,
    downloadUrl: done ? signExportLink(e.id).url : null,
    verifyPath: done && e.signed && e.verifyToken ? `/verify/${e.verifyToken}` : null,
  };
}
