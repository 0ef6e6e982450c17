import type { Trx } from "@/db/knex";
import { AppError } from "@/lib/app-error";
import { notifyAfterCommit } from "@/lib/notifications/notify-review";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import { recordAudit } from "@/lib/data/audit";
import type { ActingUser } from "@/lib/data/users";
import { loadReviewPackage } from "./load-review-package";
import { settlePackageState } from "./settle-package-state";
import { withTransaction } from "./with-transaction";

/** A range of the package's text, with the quoted words so the editor can find it again after edits. */
export type RemarkAnchor = { from: number; to: number; quote: string };

export type CreateRemarkOptions = {
  actor: ActingUser;
  packageId: string;
  text: string;
  /** The calc the remark is on; or an anchor in the text; or neither for a remark on the whole package. */
  calcId?: string | null;
  anchor?: RemarkAnchor | null;
  trx?: Trx;
};

/** Opens a remark. A checked package falls back to in check, since a remark is now open on it. */
export async function createRemark({ actor, packageId, text, calcId = null, anchor = null, trx }: CreateRemarkOptions): Promise<{ id: string }> {
  const body = text.trim();
  if (!body) throw new AppError("INVALID", "A remark needs some text.", "text");
  if (anchor && !(Number.isInteger(anchor.from) && Number.isInteger(anchor.to) && anchor.from >= 0 && anchor.to >= anchor.from)) {
    throw new AppError("INVALID", "The anchor must be a range with 0 ≤ from ≤ to.", "anchor");
  }
  return withTransaction(trx, async (t) => {
    const { pkg } = await loadReviewPackage({ actor, packageId, permission: "remark.create", refusal: "Only an engineer, the checker or the project engineer can raise a remark.", trx: t });
    if (pkg.status === "issued") throw new AppError("CONFLICT", "This package is issued and cannot change; start the next revision and raise the remark there.");
    if (calcId && !extractCalcs(pkg.document).some((c) => c.id === calcId)) throw new AppError("INVALID", "This package has no calc with that id.", "calcId");
    const [row] = await t
      .insert({ packageId: pkg.id, calcId, anchor: anchor ? JSON.stringify(anchor) : null, text: body, openedBy: actor.id })
      .into("remarks")
      .returning("id");
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "remark.create", entityType: "remark", entityId: row.id, projectId: pkg.projectId, data: { packageId: pkg.id, calcId } }, t);
    await settlePackageState({ actor, pkg, trx: t });
    notifyAfterCommit(t, { kind: "remark.raised", packageId: pkg.id, remarkId: row.id as string, actorId: actor.id });
    return { id: row.id as string };
  });
}
