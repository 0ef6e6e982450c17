import { db } from "@/db/knex";
import { AppError, notFound } from "@/lib/app-error";
import type { PackageEvaluation } from "@/lib/calcs/calc-types";
import type { ActingUser } from "@/lib/data/users";
import { validatePackageDocument } from "@/lib/document/validate-package-document";
import { settlePackageState } from "@/lib/review/settle-package-state";

export type SaveDocumentOptions = { actor: ActingUser; projectId: string; packageId: string; version: number; document: unknown };

export type SaveDocumentResult =
  | { ok: true; version: number; savedAt: string; evaluation: PackageEvaluation }
  | { ok: false; conflict: { version: number; document: unknown; savedAt: string; savedBy: string } };

/**
 * Stores a package's document if it validates and every calc's inputs are
 * sound (the server recomputes them; browser results are never trusted), and
 * only if nobody saved a newer version meanwhile. One transaction: read the
 * row for update, compare versions, write, bump.
 */
export async function saveDocument({ actor, projectId, packageId, version, document }: SaveDocumentOptions): Promise<SaveDocumentResult> {
  const checked = validatePackageDocument(document);
  if (!checked.ok) throw new AppError("INVALID", checked.message, checked.path);

  return db().transaction(async (trx) => {
    const row = await trx
      .from("packages as k")
      .leftJoin("users as u", "u.id", "k.updatedBy")
      .select("k.version", "k.status", "k.document", "k.updatedAt", "k.title", "k.assignedChecker", "u.name as savedBy")
      .where({ "k.id": packageId, "k.projectId": projectId })
      .forUpdate("k")
      .first();
    if (!row) throw notFound("Package");
    if (row.status === "issued") throw new AppError("CONFLICT", "This package is issued and can no longer change; work continues on the next revision.");
    if (row.version !== version) {
      return { ok: false, conflict: { version: row.version, document: row.document, savedAt: new Date(row.updatedAt).toISOString(), savedBy: row.savedBy ?? "someone" } };
    }
    const [saved] = await trx
      .from("packages")
      .where({ id: packageId })
      .update({ document: JSON.stringify(checked.document), version: version + 1, updatedAt: trx.fn.now(), updatedBy: actor.id })
      .returning(["version", "updatedAt"]);
    // A checked package whose calc inputs changed goes back to in check on this very save.
    await settlePackageState({ actor, pkg: { id: packageId, projectId, title: row.title, status: row.status, assignedChecker: row.assignedChecker, document: checked.document }, trx });
    return { ok: true, version: saved.version, savedAt: new Date(saved.updatedAt).toISOString(), evaluation: checked.evaluation };
  });
}
