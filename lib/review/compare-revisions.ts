import type { Trx } from "@/db/knex";
import { notFound } from "@/lib/app-error";
import type { CalcResult } from "@/lib/calcs/calc-types";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import { isUuid } from "@/lib/data/projects";
import type { ActingUser } from "@/lib/data/users";
import { compareSnapshots } from "./compare/compare-snapshots";
import type { CalcChange, Snapshot, TextChange } from "./compare/snapshot";
import { loadReviewPackage, type ReviewPackage } from "./load-review-package";
import { withTransaction } from "./with-transaction";

/** A revision id, or "draft" for the package's current document. */
export type CompareSide = string | "draft";

export type RemarkEvent = { id: string; calcId: string | null; calcLabel: string | null; text: string; state: string; openedBy: string; createdAt: Date; closedBy: string | null; closedAt: Date | null };

export type RevisionComparison = {
  from: { id: CompareSide; label: string; at: Date };
  to: { id: CompareSide; label: string; at: Date };
  calcs: CalcChange[];
  text: TextChange[];
  /** Raised after `from` and up to `to`; closed in the same window. */
  remarks: { raised: RemarkEvent[]; closed: RemarkEvent[] };
  /** The newer document, for showing the narrative with change bars. */
  document: unknown;
};

export type CompareRevisionsOptions = { actor: ActingUser; packageId: string; from: CompareSide; to: CompareSide; trx?: Trx };

type Side = Snapshot & { id: CompareSide; at: Date; number: number };

/**
 * Compares two revisions of a package, or a revision and the current draft,
 * as the acting user may read them (another firm's package is not found).
 * The older side is always `from`: sides given newest first are swapped.
 */
export async function compareRevisions({ actor, packageId, from, to, trx }: CompareRevisionsOptions): Promise<RevisionComparison> {
  return withTransaction(trx, async (t) => {
    const { pkg } = await loadReviewPackage({ actor, packageId, permission: "revision.read", refusal: "You cannot read this package's revisions.", lock: false, trx: t });
    let older = await loadSide(t, pkg, from);
    let newer = await loadSide(t, pkg, to);
    if (older.number > newer.number) [older, newer] = [newer, older];
    const diff = compareSnapshots(older, newer);
    const labels = new Map([...extractCalcs(older.document), ...extractCalcs(newer.document)].map((c) => [c.id, c.label]));
    const events: (Omit<RemarkEvent, "calcLabel">)[] = await t
      .from("remarks as r")
      .join("users as o", "o.id", "r.openedBy")
      .leftJoin("users as c", "c.id", "r.closedBy")
      .select("r.id", "r.calcId", "r.text", "r.state", "o.name as openedBy", "r.createdAt", "c.name as closedBy", "r.closedAt")
      .where("r.packageId", pkg.id)
      .andWhere((q) => q.where((w) => w.where("r.createdAt", ">", older.at).andWhere("r.createdAt", "<=", newer.at)).orWhere((w) => w.where("r.closedAt", ">", older.at).andWhere("r.closedAt", "<=", newer.at)))
      .orderBy([{ column: "r.createdAt" }, { column: "r.id" }]);
    const within = (d: Date | null) => d !== null && d > older.at && d <= newer.at;
    const withLabel = events.map((e) => ({ ...e, calcLabel: e.calcId ? (labels.get(e.calcId) ?? null) : null }));
    return {
      from: { id: older.id, label: older.label, at: older.at },
      to: { id: newer.id, label: newer.label, at: newer.at },
      calcs: diff.calcs,
      text: diff.text,
      remarks: { raised: withLabel.filter((e) => within(e.createdAt)), closed: withLabel.filter((e) => within(e.closedAt)) },
      document: newer.document,
    };
  });
}

/** One side: a frozen revision of this package, or the draft recomputed now (it sorts after every revision). */
async function loadSide(t: Trx, pkg: ReviewPackage, side: CompareSide): Promise<Side> {
  if (side === "draft") {
    const results = evaluateCalcs({ calcs: extractCalcs(pkg.document) }).results;
    return { id: "draft", label: pkg.status === "issued" ? "Current (issued)" : "Draft", document: pkg.document, results, at: new Date(), number: Number.POSITIVE_INFINITY };
  }
  if (!isUuid(side)) throw notFound("Revision");
  const row: { id: string; label: string; number: number; document: unknown; results: Record<string, CalcResult>; issuedAt: Date } | undefined = await t
    .from("revisions")
    .select("id", "label", "number", "document", "results", "issuedAt")
    .where({ id: side, packageId: pkg.id })
    .first();
  if (!row) throw notFound("Revision");
  return { id: row.id, label: `Rev ${row.label}`, document: row.document, results: row.results, at: row.issuedAt, number: row.number };
}
