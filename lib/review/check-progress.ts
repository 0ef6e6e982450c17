import type { Trx } from "@/db/knex";
import type { ActingUser } from "@/lib/data/users";
import { computeCheckProgress, type CheckProgress } from "./compute-check-progress";
import { loadReviewPackage } from "./load-review-package";
import { withTransaction } from "./with-transaction";

export type CheckProgressOptions = { actor: ActingUser; packageId: string; trx?: Trx };

/** n of m calcs checked, the marks cleared by later input changes, and the remarks still open. */
export async function checkProgress({ actor, packageId, trx }: CheckProgressOptions): Promise<CheckProgress> {
  return withTransaction(trx, async (t) => {
    const { pkg } = await loadReviewPackage({ actor, packageId, permission: "package.read", refusal: "You cannot read this package.", lock: false, trx: t });
    return computeCheckProgress({ packageId: pkg.id, document: pkg.document, trx: t });
  });
}
