import type { Trx } from "@/db/knex";
import type { ActingUser } from "@/lib/data/users";
import { loadReviewPackage } from "./load-review-package";
import { withTransaction } from "./with-transaction";

export type RevisionHead = { id: string; number: number; label: string; issuedAt: Date };

/** The package's issued revisions, oldest first, without their frozen content: for pickers and links. */
export async function listRevisionHeads({ actor, packageId, trx }: { actor: ActingUser; packageId: string; trx?: Trx }): Promise<RevisionHead[]> {
  return withTransaction(trx, async (t) => {
    const { pkg } = await loadReviewPackage({ actor, packageId, permission: "revision.read", refusal: "You cannot read this package's revisions.", lock: false, trx: t });
    return t.from("revisions").select("id", "number", "label", "issuedAt").where({ packageId: pkg.id }).orderBy("number");
  });
}
