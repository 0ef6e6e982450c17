import type { Trx } from "@/db/knex";
import type { ActingUser } from "@/lib/data/users";
import type { ResponseLetter } from "@/lib/report/report-model";
import { withTransaction } from "@/lib/review/with-transaction";
import { loadPlanReviewPackage } from "./load-plan-review-package";
import { loadResponseLetter } from "./load-response-letter";

export type GetResponseLetterOptions = { actor: ActingUser; packageId: string; trx?: Trx };

export type ResponseLetterPreview = {
  /** The revision whose comments the draft answers, or null when none has comments. */
  answers: { id: string; label: string } | null;
  letter: ResponseLetter | null;
  /** What would refuse the issue of the next revision, in words. */
  problems: string[];
};

/** The letter as the current draft would send it, for every project member to read. */
export async function getResponseLetter({ actor, packageId, trx }: GetResponseLetterOptions): Promise<ResponseLetterPreview> {
  return withTransaction(trx, async (t) => {
    const { pkg } = await loadPlanReviewPackage({ actor, packageId, write: false, trx: t });
    const built = await loadResponseLetter({ packageId: pkg.id, document: pkg.document, trx: t });
    if (!built) return { answers: null, letter: null, problems: [] };
    return { answers: { id: built.answers.id, label: built.answers.label }, letter: built.letter, problems: built.problems };
  });
}
