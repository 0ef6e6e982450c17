import type { DbOrTrx } from "@/db/knex";
import { db } from "@/db/knex";
import { calcKindNames } from "@/lib/calcs/calc-kind-names";
import type { CalcResult } from "@/lib/calcs/calc-types";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import type { ExportRow } from "@/lib/data/exports";
import type { PackageDocument } from "@/lib/document/document-types";
import { env } from "@/lib/env";
import type { ReportSource } from "@/lib/report/build-report-model";
import type { CheckRecordRow, ReportSeal, ResponseLetter, RevisionLogRow } from "@/lib/report/report-model";
import type { CheckRecord } from "@/lib/review/build-check-record";
import { computeCheckProgress } from "@/lib/review/compute-check-progress";
import { computeFingerprint } from "@/lib/review/compute-fingerprint";
import { SAFETY_TEXT } from "@/lib/safety-notice";
import type { FrozenSeal } from "@/lib/seals/seal-validity";
import { getObject } from "@/lib/storage/get-object";
import { changedCalcs } from "./changed-calcs";
import { loadFigureImages } from "./figure-images";

type RevisionRow = { id: string; number: number; label: string; document: PackageDocument; results: Record<string, CalcResult>; checkRecord: CheckRecord; issuedAt: Date; issuer: string; fingerprint: string; seal?: FrozenSeal | null; responseLetter?: unknown };

const day = (d: Date | string) => new Date(d).toISOString().slice(0, 10);

/**
 * Everything buildReportModel needs for one export row, read by the worker
 * under the row's own firm and package. A draft is the current document with
 * today's check marks (buildReportModel recomputes its calcs); an issued
 * revision is exactly what was frozen: document, results, check record, seal.
 */
export async function loadReportSource(exp: ExportRow, trx: DbOrTrx = db()): Promise<ReportSource> {
  const project = await trx
    .from("projects as p")
    .join("firms as f", "f.id", "p.firmId")
    .select("p.name", "p.jobNumber", "p.client", "p.site", "p.paperSize", "f.name as firmName")
    .where({ "p.id": exp.projectId, "p.firmId": exp.firmId })
    .first();
  const pkg = await trx
    .from("packages as k")
    .leftJoin("users as u", "u.id", "k.createdBy")
    .select("k.id", "k.title", "k.document", "k.updatedAt", "k.createdAt", "u.name as author")
    .where({ "k.id": exp.packageId, "k.projectId": exp.projectId })
    .first();
  if (!project || !pkg) throw new Error("The package or its project no longer exists.");
  // Columns added by later migrations (seal, response_letter) are read when present: select * tolerates their absence.
  const revisions: RevisionRow[] = await trx
    .from("revisions as r")
    .join("users as u", "u.id", "r.issuedBy")
    .select("r.*", "u.name as issuer")
    .where("r.packageId", pkg.id)
    .orderBy("r.number");

  const target = exp.revisionId ? revisions.find((r) => r.id === exp.revisionId) : undefined;
  if (exp.revisionId && !target) throw new Error("The revision to export does not belong to this package.");
  const earlier = target ? revisions.filter((r) => r.number < target.number) : revisions;
  const previous = earlier.at(-1) ?? null;

  let document: PackageDocument;
  let results: Record<string, CalcResult> | undefined;
  let checkRecord: CheckRecordRow[];
  let fingerprint: string;
  let seal: ReportSeal | null = null;
  let responseLetter: ResponseLetter | null = null;
  let changedCalcIds: string[];
  if (target) {
    document = target.document;
    results = target.results;
    checkRecord = checkRows(target.checkRecord.calcs, document);
    fingerprint = target.fingerprint;
    seal = target.seal ? await reportSeal(target.seal) : null;
    responseLetter = asResponseLetter(target.responseLetter);
    changedCalcIds = changedCalcs(previous, { document, results });
  } else {
    document = pkg.document as PackageDocument;
    const progress = await computeCheckProgress({ packageId: pkg.id, document, trx });
    checkRecord = checkRows(progress.calcs.map((c) => ({ calcId: c.calcId, label: c.label, state: c.state, checker: c.checkerName, at: c.at ? c.at.toISOString() : null })), document);
    // Computed here only for the revision marks and the fingerprint; buildReportModel recomputes for the sheets.
    const draftResults = JSON.parse(JSON.stringify(evaluateCalcs({ calcs: extractCalcs(document) }).results)) as Record<string, unknown>;
    changedCalcIds = changedCalcs(previous, { document, results: draftResults });
    fingerprint = computeFingerprint({ document, results: draftResults, checkRecord: progress.calcs.map((c) => ({ calcId: c.calcId, state: c.state, inputsHash: c.inputsHash })), number: (previous?.number ?? -1) + 1 });
  }

  const revisionLog: RevisionLogRow[] = (target ? [...earlier, target] : revisions).map((r, i) => ({
    label: r.label,
    date: day(r.issuedAt),
    by: r.issuer,
    description: i === 0 ? "First issue" : r.responseLetter ? `Revised in response to plan-review comments on Rev ${revisions[i - 1].label}` : "Revised and reissued",
  }));
  if (!target) revisionLog.push({ label: "Draft", date: day(new Date()), by: pkg.author ?? "—", description: "Preliminary — not for construction" });

  const checked = checkRecord.filter((c) => c.state === "checked" && c.checker && c.checkedAt).sort((a, b) => String(b.checkedAt).localeCompare(String(a.checkedAt)));
  const e = env();
  return {
    document,
    results,
    checkRecord,
    revisionLog,
    responseLetter,
    changedCalcIds,
    figureImages: await loadFigureImages({ firmId: exp.firmId, packageId: pkg.id, document }),
    meta: {
      firmName: project.firmName,
      projectName: project.name,
      jobNumber: project.jobNumber,
      client: project.client || null,
      site: project.site || null,
      paperSize: project.paperSize === "Letter" ? "letter" : "a4",
      packageId: pkg.id,
      packageTitle: pkg.title,
      revision: target ? { id: target.id, label: target.label, number: target.number, issuedAt: new Date(target.issuedAt).toISOString(), issuedBy: target.issuer } : null,
      previousRevisionLabel: previous?.label ?? null,
      fingerprint,
      // The package's author prepares it; an issued revision is dated by its issue.
      preparedBy: { name: pkg.author ?? (target?.issuer ?? "—"), date: day(target ? target.issuedAt : pkg.updatedAt) },
      checkedBy: checked[0] ? { name: checked[0].checker as string, date: day(checked[0].checkedAt as string) } : null,
      seal,
      verification: exp.verifyToken ? { url: `${e.APP_URL.replace(/\/$/, "")}/verify/${exp.verifyToken}`, token: exp.verifyToken } : null,
      generatedAt: new Date().toISOString(),
      safetyText: SAFETY_TEXT,
    },
  };
}

function checkRows(calcs: { calcId: string; label: string; state: string; checker: string | null; at: string | null }[], document: unknown): CheckRecordRow[] {
  const kinds = new Map(extractCalcs(document).map((c) => [c.id, calcKindNames[c.kind] ?? c.kind]));
  return calcs.map((c) => ({
    calcLabel: c.label,
    calcTitle: kinds.get(c.calcId) ?? c.label,
    checker: c.checker,
    checkedAt: c.at,
    state: c.state === "checked" || c.state === "returned" ? c.state : "unchecked",
  }));
}

/** The frozen seal with its image, read by the content-addressed key it was issued with. */
async function reportSeal(seal: FrozenSeal): Promise<ReportSeal> {
  const obj = seal.imageKey ? await getObject(seal.imageKey) : null;
  const type = seal.imageType === "svg" ? "image/svg+xml" : "image/png";
  return { name: seal.name, licenceNumber: seal.licenceNumber, jurisdiction: seal.jurisdiction, expiresOn: seal.expiresOn, imageDataUri: obj ? `data:${type};base64,${obj.body.toString("base64")}` : null };
}

/** A frozen response letter in the report model's shape, or null (older revisions, or a shape this build does not know). */
function asResponseLetter(value: unknown): ResponseLetter | null {
  if (!value || typeof value !== "object") return null;
  const v = value as Partial<ResponseLetter>;
  return typeof v.answersRevisionLabel === "string" && Array.isArray(v.comments) ? (v as ResponseLetter) : null;
}
