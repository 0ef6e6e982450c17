import { db, type DbOrTrx } from "@/db/knex";
import type { ActingUser } from "./users";

export type PackageStatus = "draft" | "in_check" | "checked" | "issued";

export type PackageSummary = { id: string; projectId: string; title: string; version: number; status: PackageStatus; assignedChecker: string | null; createdAt: Date; updatedAt: Date };
export type PackageWithDocument = PackageSummary & { document: unknown };

const summaryColumns = ["k.id", "k.projectId", "k.title", "k.version", "k.status", "k.assignedChecker", "k.createdAt", "k.updatedAt"];

export async function listPackages(projectId: string, trx: DbOrTrx = db()): Promise<PackageSummary[]> {
  return trx.from("packages as k").select(...summaryColumns).where("k.projectId", projectId).orderBy("k.updatedAt", "desc");
}

/**
 * Which project a package belongs to, if the acting user's firm owns it.
 * The caller still resolves the user's access to that project.
 */
export async function findPackageProjectId(actor: ActingUser, packageId: string, trx: DbOrTrx = db()): Promise<string | undefined> {
  const row = await trx
    .from("packages as k")
    .join("projects as p", "p.id", "k.projectId")
    .select("k.projectId")
    .where({ "k.id": packageId, "p.firmId": actor.firmId })
    .first();
  return row?.projectId as string | undefined;
}

/** The document column is large: it is read only when asked for. */
export async function findPackage(projectId: string, packageId: string, opts: { withDocument?: boolean } = {}, trx: DbOrTrx = db()): Promise<PackageWithDocument | undefined> {
  const cols = opts.withDocument ? [...summaryColumns, "k.document"] : summaryColumns;
  return trx.from("packages as k").select(...cols).where({ "k.id": packageId, "k.projectId": projectId }).first();
}

export async function createPackage(o: { projectId: string; title: string; createdBy: string }, trx: DbOrTrx = db()): Promise<PackageSummary> {
  const [row] = await trx.insert(o).into("packages").returning(summaryColumns.map((c) => c.slice(2)));
  return row as PackageSummary;
}

export async function renamePackage(packageId: string, title: string, trx: DbOrTrx = db()): Promise<PackageSummary> {
  const [row] = await trx.from("packages").where({ id: packageId }).update({ title, updatedAt: trx.fn.now() }).returning(summaryColumns.map((c) => c.slice(2)));
  return row as PackageSummary;
}

export async function deletePackage(packageId: string, trx: DbOrTrx = db()): Promise<void> {
  await trx.from("packages").where({ id: packageId }).delete();
}
