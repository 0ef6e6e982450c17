import type { Trx } from "@/db/knex";
import { AppError } from "@/lib/app-error";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import { recordAudit } from "@/lib/data/audit";
import type { PackageStatus } from "@/lib/data/packages";
import type { ActingUser } from "@/lib/data/users";
import { hashCalcInputs } from "./hash-calc-inputs";
import { loadReviewPackage } from "./load-review-package";
import { settlePackageState } from "./settle-package-state";
import { withTransaction } from "./with-transaction";

export type MarkCalcOptions = { actor: ActingUser; packageId: string; calcId: string; state: "checked" | "returned"; trx?: Trx };

/**
 * The checker marks one calc checked or returned. The mark stores the hash of
 * the calc's inputs as they are now, so it lapses by itself when they change.
 * Marking the last calc can make the package checked.
 */
export async function markCalc({ actor, packageId, calcId, state, trx }: MarkCalcOptions): Promise<{ inputsHash: string; status: PackageStatus }> {
  return withTransaction(trx, async (t) => {
    const { pkg } = await loadReviewPackage({ actor, packageId, permission: "calc.check", refusal: "Only the checker marks calcs checked or returned.", trx: t });
    if (pkg.status === "draft") throw new AppError("CONFLICT", "This package is a draft; it must be submitted for check before its calcs can be marked.");
    if (pkg.status === "issued") throw new AppError("CONFLICT", "This package is issued; its check record is frozen in the revision.");
    if (pkg.assignedChecker !== actor.id) throw new AppError("FORBIDDEN", "Only the checker assigned to this package marks its calcs.");
    const calc = extractCalcs(pkg.document).find((c) => c.id === calcId);
    if (!calc) throw new AppError("NOT_FOUND", "This package has no calc with that id.");
    const inputsHash = hashCalcInputs({ inputs: calc.inputs });
    await t
      .insert({ packageId: pkg.id, calcId, state, checker: actor.id, at: t.fn.now(), inputsHash })
      .into("calcChecks")
      .onConflict(["packageId", "calcId"])
      .merge(["state", "checker", "at", "inputsHash"]);
    await recordAudit(
      { firmId: actor.firmId, actorId: actor.id, action: `calc.${state}`, entityType: "calc", entityId: null, projectId: pkg.projectId, data: { packageId: pkg.id, calcId, label: calc.label, inputsHash } },
      t,
    );
    return { inputsHash, status: await settlePackageState({ actor, pkg, trx: t }) };
  });
}
