import type { Trx } from "@/db/knex";
import { AppError } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import { insertComments, listPackageComments, nextCommentPosition, type PlanReviewComment } from "@/lib/data/plan-review-comments";
import type { ActingUser } from "@/lib/data/users";
import { withTransaction } from "@/lib/review/with-transaction";
import { recordCommentsInput } from "@/lib/validation/plan-review-input";
import { loadPlanReviewPackage } from "./load-plan-review-package";
import { parseInput } from "./parse-input";
import { splitNumberedList, type NumberedItem } from "./split-numbered-list";

export type RecordCommentsOptions = { actor: ActingUser; packageId: string; input: unknown; trx?: Trx };

const MAX_COMMENTS = 300;
const MAX_TEXT = 10_000;

/**
 * Records the permit office's comments on the latest issued revision: one
 * comment, or a pasted list split into one comment per number. A number
 * already recorded on that revision is refused, so pasting the same list
 * twice does not double it.
 */
export async function recordComments({ actor, packageId, input, trx }: RecordCommentsOptions): Promise<PlanReviewComment[]> {
  const body = parseInput(recordCommentsInput, input);
  return withTransaction(trx, async (t) => {
    const { pkg, answers } = await loadPlanReviewPackage({ actor, packageId, write: true, trx: t });
    if (!answers) throw new AppError("INVALID", "This package has no issued revision yet; comments are recorded on an issued revision.", "revisionId");
    if (body.revisionId !== answers.id) {
      throw new AppError("INVALID", `Record comments on Rev ${answers.label}, the latest issued revision: the current draft answers it.`, "revisionId");
    }
    const existing = await listPackageComments(pkg.id, t, { revisionId: answers.id });
    const items = itemsOf(body, existing.length);
    const field = body.paste !== undefined ? "paste" : "number";
    const seen = new Set(existing.map((c) => c.number.toLowerCase()));
    for (const item of items) {
      if (item.text.length > MAX_TEXT) throw new AppError("INVALID", `Comment ${item.number} is longer than 10,000 characters.`, body.paste !== undefined ? "paste" : "text");
      const key = item.number.toLowerCase();
      if (seen.has(key)) throw new AppError("INVALID", `Comment ${item.number} is already recorded on Rev ${answers.label}.`, field);
      seen.add(key);
    }
    const first = await nextCommentPosition(pkg.id, answers.id, t);
    const ids = await insertComments(
      items.map((item, i) => ({
        firmId: actor.firmId, projectId: pkg.projectId, packageId: pkg.id, revisionId: answers.id, number: item.number, position: first + i, text: item.text,
        reviewer: body.reviewer?.trim() || null, receivedOn: body.receivedOn ?? null, createdBy: actor.id,
      })),
      t,
    );
    await recordAudit(
      { firmId: actor.firmId, actorId: actor.id, action: "plan_review.record", entityType: "package", entityId: pkg.id, projectId: pkg.projectId, data: { revisionId: answers.id, revision: answers.label, numbers: items.map((i) => i.number), commentIds: ids } },
      t,
    );
    const saved = new Set(ids);
    return (await listPackageComments(pkg.id, t, { revisionId: answers.id })).filter((c) => saved.has(c.id));
  });
}

function itemsOf(body: { paste?: string; number?: string; text?: string }, alreadyRecorded: number): NumberedItem[] {
  if (body.paste === undefined) return [{ number: body.number as string, text: body.text as string }];
  const split = splitNumberedList(body.paste);
  if (split.items.length === 0) throw new AppError("INVALID", "Paste the comments as a numbered list.", "paste");
  if (split.items.length > MAX_COMMENTS) throw new AppError("INVALID", `Paste at most ${MAX_COMMENTS} comments at once.`, "paste");
  // Text without numbering is one comment, numbered after those already recorded.
  return split.numbered ? split.items : [{ number: String(alreadyRecorded + 1), text: split.items[0].text }];
}
