import type { Trx } from "@/db/knex";
import { notFound } from "@/lib/app-error";
import { isUuid } from "@/lib/data/projects";
import type { ActingUser } from "@/lib/data/users";
import { compareRevisions, type CompareSide } from "./compare-revisions";
import { loadReviewPackage } from "./load-review-package";
import { withTransaction } from "./with-transaction";

export type ChangedCalcIdsSinceOptions = {
  actor: ActingUser;
  packageId: string;
  /** The revision whose content counts as unchanged; by default the one issued just before `to`. */
  since?: string;
  /** A revision id or "draft" (default). */
  to?: CompareSide;
  trx?: Trx;
};

/**
 * Ids of the calcs in `to` that are new or whose inputs or results changed
 * since the earlier revision: what an export marks as revised sheets. Empty
 * when `to` has no earlier revision (a first issue revises nothing).
 */
export async function changedCalcIdsSince({ actor, packageId, since, to = "draft", trx }: ChangedCalcIdsSinceOptions): Promise<string[]> {
  return withTransaction(trx, async (t) => {
    // The access check comes first, so an empty answer never tells that another firm's package exists.
    const { pkg } = await loadReviewPackage({ actor, packageId, permission: "revision.read", refusal: "You cannot read this package's revisions.", lock: false, trx: t });
    const base = since ?? (await previousRevisionId(t, pkg.id, to));
    if (!base) return [];
    const comparison = await compareRevisions({ actor, packageId: pkg.id, from: base, to, trx: t });
    return comparison.calcs.filter((c) => c.change !== "removed").map((c) => c.calcId);
  });
}

/** The revision issued just before `to` (the latest one, for the draft). */
async function previousRevisionId(t: Trx, packageId: string, to: CompareSide): Promise<string | undefined> {
  const q = t.from("revisions").select("id").where({ packageId }).orderBy("number", "desc");
  if (to !== "draft") {
    const target: { number: number } | undefined = isUuid(to) ? await t.from("revisions").select("number").where({ id: to, packageId }).first() : undefined;
    if (!target) throw notFound("Revision");
    q.where("number", "<", target.number);
  }
  const row: { id: string } | undefined = await q.first();
  return row?.id;
}
