import { db, type DbOrTrx } from "@/db/knex";

export type ExportFormat = "pdf" | "docx";
export type ExportStatus = "queued" | "rendering" | "done" | "failed";

export type ExportRow = {
  id: string;
  firmId: string;
  projectId: string;
  packageId: string;
  revisionId: string | null;
  format: ExportFormat;
  status: ExportStatus;
  sheet: number | null;
  sheetCount: number | null;
  error: string | null;
  objectKey: string | null;
  byteSize: number | null;
  sha256: string | null;
  signed: boolean;
  verifyToken: string | null;
  requestedBy: string | null;
  attempts: number;
  createdAt: Date;
  startedAt: Date | null;
  finishedAt: Date | null;
};

const columns = ["id", "firmId", "projectId", "packageId", "revisionId", "format", "status", "sheet", "sheetCount", "error", "objectKey", "byteSize", "sha256", "signed", "verifyToken", "requestedBy", "attempts", "createdAt", "startedAt", "finishedAt"];

export type NewExport = Pick<ExportRow, "firmId" | "projectId" | "packageId" | "revisionId" | "format" | "requestedBy"> & { verifyToken: string | null };

export async function insertExport(row: NewExport, trx: DbOrTrx = db()): Promise<ExportRow> {
  const [out] = await trx.insert(row).into("exports").returning(columns);
  return out as ExportRow;
}

/** By id inside one firm; the caller still checks the actor's access to the project. */
export async function findExport(firmId: string, exportId: string, trx: DbOrTrx = db()): Promise<ExportRow | undefined> {
  return trx.from("exports").select(columns).where({ id: exportId, firmId }).first();
}

/** The worker's read: the job names the export, and the row names its firm. */
export async function findExportForJob(exportId: string, trx: DbOrTrx = db()): Promise<ExportRow | undefined> {
  return trx.from("exports").select(columns).where({ id: exportId }).first();
}

export type ExportListRow = ExportRow & { requestedByName: string | null; revisionLabel: string | null };

export async function listPackageExports(packageId: string, limit: number, trx: DbOrTrx = db()): Promise<ExportListRow[]> {
  return trx
    .from("exports as e")
    .leftJoin("users as u", "u.id", "e.requestedBy")
    .leftJoin("revisions as r", "r.id", "e.revisionId")
    .select(...columns.map((c) => `e.${c}`), "u.name as requestedByName", "r.label as revisionLabel")
    .where("e.packageId", packageId)
    .orderBy([{ column: "e.createdAt", order: "desc" }, { column: "e.id", order: "desc" }])
    .limit(limit);
}

export async function updateExport(exportId: string, patch: Partial<Omit<ExportRow, "id" | "firmId" | "createdAt">> & { attempts?: number }, trx: DbOrTrx = db()): Promise<void> {
  await trx.from("exports").where({ id: exportId }).update(patch);
}

/** Counts one more attempt and marks the row rendering; returns the attempt number. */
export async function startExportAttempt(exportId: string, trx: DbOrTrx = db()): Promise<number> {
  const [row] = await trx
    .from("exports")
    .where({ id: exportId })
    .update({ status: "rendering", attempts: trx.raw("attempts + 1"), startedAt: trx.fn.now(), sheet: null, sheetCount: null, error: null })
    .returning(["attempts"]);
  return row.attempts as number;
}

export type VerificationRow = {
  projectName: string;
  jobNumber: string;
  packageTitle: string;
  revisionLabel: string;
  issuer: string;
  issuedAt: Date;
  fingerprint: string;
  sha256: string;
};

/** The public verification lookup: only done, signed exports of issued revisions have a token that answers. */
export async function findVerification(token: string, trx: DbOrTrx = db()): Promise<VerificationRow | undefined> {
  return trx
    .from("exports as e")
    .join("revisions as r", "r.id", "e.revisionId")
    .join("packages as k", "k.id", "e.packageId")
    .join("projects as p", "p.id", "e.projectId")
    .join("users as u", "u.id", "r.issuedBy")
    .select("p.name as projectName", "p.jobNumber", "k.title as packageTitle", "r.label as revisionLabel", "u.name as issuer", "r.issuedAt", "r.fingerprint", "e.sha256")
    .where({ "e.verifyToken": token, "e.status": "done", "e.signed": true })
    .first();
}
