import type { Trx } from "@/db/knex";
import type { ActingUser } from "@/lib/data/users";
import type { ResponseLetter } from "@/lib/report/report-model";
import type { FrozenSeal } from "@/lib/seals/seal-validity";
import { loadReviewPackage } from "./load-review-package";
import { withTransaction } from "./with-transaction";

/** A frozen revision with everything its fingerprint covers. */
export type Revision = {
  id: string;
  packageId: string;
  number: number;
  label: string;
  document: unknown;
  results: unknown;
  checkRecord: unknown;
  issuedBy: string;
  issuedAt: Date;
  fingerprint: string;
  /** The seal it was issued under; null for revisions issued before seal profiles existed. */
  seal: FrozenSeal | null;
  /** The plan-review response letter it carries (answering the previous revision's comments); null when none. */
  responseLetter: ResponseLetter | null;
};

export type ListRevisionsOptions = { actor: ActingUser; packageId: string; trx?: Trx };

/** The package's issued revisions, oldest first, with their frozen content. */
export async function listRevisions({ actor, packageId, trx }: ListRevisionsOptions): Promise<Revision[]> {
  return withTransaction(trx, async (t) => {
    const { pkg } = await loadReviewPackage({ actor, packageId, permission: "package.read", refusal: "You cannot read this package.", lock: false, trx: t });
    return t
      .from("revisions")
      .select("id", "packageId", "number", "label", "document", "results", "checkRecord", "issuedBy", "issuedAt", "fingerprint", "seal", "responseLetter")
      .where({ packageId: pkg.id })
      .orderBy("number");
  });
}
