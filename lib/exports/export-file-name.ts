import { db, type DbOrTrx } from "@/db/knex";
import type { ExportRow } from "@/lib/data/exports";

/** Letters, digits, dot and dash; anything else becomes one dash, so the name is safe on every system and in a header. */
function safe(part: string): string {
  return part.normalize("NFKD").replace(/[^A-Za-z0-9.-]+/g, "-").replace(/^-+|-+$/g, "").slice(0, 60) || "package";
}

/** e.g. KV-2026-014_Truss-design_Rev0.pdf, or …_DRAFT.docx for a draft. */
export async function exportFileName(exp: ExportRow, trx: DbOrTrx = db()): Promise<string> {
  const row = await trx
    .from("packages as k")
    .join("projects as p", "p.id", "k.projectId")
    .leftJoin("revisions as r", function () {
      this.on("r.packageId", "k.id").andOnVal("r.id", exp.revisionId ?? "00000000-0000-0000-0000-000000000000");
    })
    .select("p.jobNumber", "k.title", "r.label")
    .where("k.id", exp.packageId)
    .first();
  const rev = row?.label ? `Rev${safe(row.label)}` : "DRAFT";
  return `${safe(row?.jobNumber ?? "export")}_${safe(row?.title ?? "package")}_${rev}.${exp.format}`;
}
