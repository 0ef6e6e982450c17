import { createHash } from "node:crypto";
import { recordAudit } from "@/lib/data/audit";
import { findExportForJob, startExportAttempt, updateExport, type ExportRow } from "@/lib/data/exports";
import { queues } from "@/lib/jobs/queues";
import { buildReportModel } from "@/lib/report/build-report-model";
import type { ReportModel } from "@/lib/report/report-model";
import { loadSigningCertificate } from "@/lib/report/sign/load-signing-certificate";
import { signPdf } from "@/lib/report/sign/sign-pdf";
import { putObject } from "@/lib/storage/put-object";
import { defaultRenderers, type ExportRenderers } from "./export-renderers";
import { exportContentType, exportObjectKey } from "./export-object-key";
import { loadReportSource } from "./load-report-source";

export type RunExportOptions = { exportId: string; renderers?: ExportRenderers };

/** Attempts in all: the first and the queue's retries. */
export const EXPORT_ATTEMPTS = queues["export.render"].retryLimit + 1;

/**
 * The export.render job: load the source, build the model, render, sign an
 * issued PDF, store the file and mark the row done. A failure before the last
 * attempt is thrown so the queue retries it (a Chromium crash included); the
 * last one marks the row failed with the reason, so no one waits on a spinner.
 */
export async function runExport({ exportId, renderers = defaultRenderers }: RunExportOptions): Promise<void> {
  const exp = await findExportForJob(exportId);
  // Gone with its package, or already settled by an earlier delivery of the same job.
  if (!exp || exp.status === "done" || exp.status === "failed") return;
  const attempt = await startExportAttempt(exp.id);
  try {
    const model = buildReportModel(await loadReportSource(exp));
    const file = await render(exp, model, renderers);
    const sha256 = createHash("sha256").update(file).digest("hex");
    const objectKey = exportObjectKey(exp.firmId, exp.id, exp.format);
    await putObject({ key: objectKey, body: file, contentType: exportContentType[exp.format], contentLength: file.length });
    await updateExport(exp.id, { status: "done", objectKey, byteSize: file.length, sha256, signed: exp.format === "pdf" && exp.revisionId !== null, error: null, finishedAt: new Date() });
    await recordAudit({ firmId: exp.firmId, actorId: exp.requestedBy, action: "export.done", entityType: "export", entityId: exp.id, projectId: exp.projectId, data: { packageId: exp.packageId, revisionId: exp.revisionId, format: exp.format, sha256, bytes: file.length } });
  } catch (error: unknown) {
    const reason = describeFailure(error);
    if (attempt < EXPORT_ATTEMPTS) {
      await updateExport(exp.id, { status: "queued", error: `Attempt ${attempt} of ${EXPORT_ATTEMPTS} failed (${reason}); trying again.` });
      throw error;
    }
    await updateExport(exp.id, { status: "failed", error: reason, finishedAt: new Date() });
    await recordAudit({ firmId: exp.firmId, actorId: exp.requestedBy, action: "export.fail", entityType: "export", entityId: exp.id, projectId: exp.projectId, data: { packageId: exp.packageId, revisionId: exp.revisionId, format: exp.format, error: reason, attempts: attempt } });
  }
}

async function render(exp: ExportRow, model: ReportModel, renderers: ExportRenderers): Promise<Buffer> {
  if (exp.format === "docx") return renderers.docx(model);
  // Progress writes are chained so they land in order and none is left running after the render.
  let progress: Promise<void> = Promise.resolve();
  const { pdf } = await renderers.pdf(model, {
    onProgress: (sheet, total) => {
      progress = progress.then(() => updateExport(exp.id, { sheet, sheetCount: total })).catch(() => undefined);
    },
  });
  await progress;
  if (!exp.revisionId || !model.meta.revision) return pdf;
  const cert = await loadSigningCertificate();
  const { meta } = model;
  return signPdf(pdf, {
    ...cert,
    name: meta.firmName,
    reason: `Issued ${meta.jobNumber} ${meta.packageTitle}, Rev ${meta.revision?.label}; package fingerprint ${meta.fingerprint}`,
    location: meta.site ?? meta.firmName,
    contactInfo: meta.verification?.url,
  });
}

/** A reason a person can act on, without a stack trace. */
function describeFailure(error: unknown): string {
  const message = error instanceof Error ? error.message : String(error);
  if (/disconnected|Target closed|Protocol error|crash/i.test(message)) return `the PDF renderer (Chromium) stopped unexpectedly: ${message}`;
  return message.length > 500 ? `${message.slice(0, 500)}…` : message;
}
