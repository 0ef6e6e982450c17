import type { DbOrTrx } from "@/db/knex";
import { listPackageComments, listRevisionRefs, type RevisionRef } from "@/lib/data/plan-review-comments";
import { buildResponseLetter, type BuiltResponseLetter } from "./build-response-letter";

export type LoadResponseLetterOptions = {
  /** Already scoped to the actor by the caller. */
  packageId: string;
  /** The document that answers the comments: the current draft. */
  document: unknown;
  trx: DbOrTrx;
};

export type AnsweringLetter = BuiltResponseLetter & { answers: RevisionRef };

/**
 * The response letter the next revision would carry: the comments on the latest
 * issued revision, answered by `document`. Null when there is no issued
 * revision yet, or no comment was recorded on it (then no letter travels).
 */
export async function loadResponseLetter({ packageId, document, trx }: LoadResponseLetterOptions): Promise<AnsweringLetter | null> {
  const [answers] = await listRevisionRefs(packageId, trx);
  if (!answers) return null;
  const comments = await listPackageComments(packageId, trx, { revisionId: answers.id });
  if (comments.length === 0) return null;
  return { answers, ...buildResponseLetter({ answersRevisionLabel: answers.label, comments, document }) };
}
