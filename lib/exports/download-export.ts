import { can } from "@/lib/access/permissions";
import { AppError, notFound } from "@/lib/app-error";
import { findExport } from "@/lib/data/exports";
import { findProjectAccess } from "@/lib/data/projects";
import type { ActingUser } from "@/lib/data/users";
import { getObject } from "@/lib/storage/get-object";
import { checkExportLink } from "./export-link";
import { exportContentType } from "./export-object-key";
import { exportFileName } from "./export-file-name";

export type DownloadExportOptions = { actor: ActingUser; exportId: string; expires: number; signature: string; now?: Date };

export type ExportDownload = { body: Buffer; contentType: string; fileName: string };

/**
 * The file behind a signed link. A bad signature, another firm's export or a
 * project the actor is not on are all "not found"; a genuine link that ran out
 * is refused with 403 and says to ask for a fresh one.
 */
export async function downloadExport({ actor, exportId, expires, signature, now = new Date() }: DownloadExportOptions): Promise<ExportDownload> {
  const link = checkExportLink(exportId, expires, signature, now);
  if (link === "invalid") throw notFound("Export");
  const exp = await findExport(actor.firmId, exportId);
  const access = exp ? await findProjectAccess(actor, exp.projectId) : undefined;
  if (!exp || !access || !can("export.read", access.grantees)) throw notFound("Export");
  if (link === "expired") throw new AppError("FORBIDDEN", "This download link has expired; open the package's exports and download again.");
  if (exp.status !== "done" || !exp.objectKey) throw notFound("Export");
  const obj = await getObject(exp.objectKey);
  if (!obj) throw notFound("Export file");
  return { body: obj.body, contentType: exportContentType[exp.format], fileName: await exportFileName(exp) };
}
