import type { Trx } from "@/db/knex";
import { can } from "@/lib/access/permissions";
import { AppError } from "@/lib/app-error";
import { notifyAfterCommit } from "@/lib/notifications/notify-review";
import { recordAudit } from "@/lib/data/audit";
import { isUuid } from "@/lib/data/projects";
import type { ActingUser } from "@/lib/data/users";
import { loadRemark } from "./load-remark";
import { loadReviewPackage } from "./load-review-package";
import { withTransaction } from "./with-transaction";

export type ReplyToRemarkOptions = { actor: ActingUser; packageId: string; remarkId: string; text: string; trx?: Trx };

/**
 * Adds a reply to a remark's thread. The author's answer (a reply by someone
 * who may edit the package, other than the remark's opener) moves it
 * open → answered; the opener replying to an answered remark reopens it,
 * because that reply means the answer did not satisfy them.
 */
export async function replyToRemark({ actor, packageId, remarkId, text, trx }: ReplyToRemarkOptions): Promise<{ id: string; state: "open" | "answered" }> {
  const body = text.trim();
  if (!body) throw new AppError("INVALID", "A reply needs some text.", "text");
  return withTransaction(trx, async (t) => {
    const { access, pkg } = await loadReviewPackage({ actor, packageId, permission: "remark.create", refusal: "Only an engineer, the checker or the project engineer can reply to a remark.", trx: t });
    if (!isUuid(remarkId)) throw new AppError("NOT_FOUND", "Remark not found.");
    const remark = await loadRemark({ packageId: pkg.id, remarkId, trx: t });
    if (remark.state === "closed") throw new AppError("CONFLICT", "This remark is closed; raise a new remark instead.");
    const isOpener = remark.openedBy === actor.id;
    let state: "open" | "answered" = remark.state;
    if (!isOpener && remark.state === "open" && can("package.edit", access.grantees)) state = "answered";
    if (isOpener && remark.state === "answered") state = "open";
    const [row] = await t.insert({ remarkId: remark.id, author: actor.id, text: body }).into("remarkReplies").returning("id");
    if (state !== remark.state) await t.from("remarks").where({ id: remark.id }).update({ state });
    await recordAudit(
      { firmId: actor.firmId, actorId: actor.id, action: "remark.reply", entityType: "remark", entityId: remark.id, projectId: pkg.projectId, data: { packageId: pkg.id, from: remark.state, to: state } },
      t,
    );
    if (state === "answered" && remark.state === "open") notifyAfterCommit(t, { kind: "remark.answered", packageId: pkg.id, remarkId: remark.id, actorId: actor.id });
    return { id: row.id as string, state };
  });
}
