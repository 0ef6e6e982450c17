import type { DbOrTrx } from "@/db/knex";
import type { CheckProgress } from "./compute-check-progress";

/** What a revision freezes about its check: who checked which calc and when, and the remarks settled on the way. */
export type CheckRecord = {
  calcs: { calcId: string; label: string; state: string; checkerId: string | null; checker: string | null; at: string | null; inputsHash: string }[];
  remarks: { id: string; calcId: string | null; openedBy: string; closedBy: string | null; closedAt: string | null }[];
};

export type BuildCheckRecordOptions = { packageId: string; progress: CheckProgress; trx: DbOrTrx };

/** Times as ISO strings, so the record serializes the same before storing and after reading it back. */
export async function buildCheckRecord({ packageId, progress, trx }: BuildCheckRecordOptions): Promise<CheckRecord> {
  const remarks: { id: string; calcId: string | null; opener: string; closer: string | null; closedAt: Date | null }[] = await trx
    .from("remarks as r")
    .join("users as o", "o.id", "r.openedBy")
    .leftJoin("users as c", "c.id", "r.closedBy")
    .select("r.id", "r.calcId", "o.name as opener", "c.name as closer", "r.closedAt")
    .where("r.packageId", packageId)
    .orderBy([{ column: "r.createdAt" }, { column: "r.id" }]);
  return {
    calcs: progress.calcs.map((c) => ({ calcId: c.calcId, label: c.label, state: c.state, checkerId: c.checkerId, checker: c.checkerName, at: c.at ? new Date(c.at).toISOString() : null, inputsHash: c.inputsHash })),
    remarks: remarks.map((r) => ({ id: r.id, calcId: r.calcId, openedBy: r.opener, closedBy: r.closer, closedAt: r.closedAt ? new Date(r.closedAt).toISOString() : null })),
  };
}
