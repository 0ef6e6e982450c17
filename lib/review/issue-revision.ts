import type { Trx } from "@/db/knex";
import { AppError } from "@/lib/app-error";
import { notifyAfterCommit } from "@/lib/notifications/notify-review";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import { recordAudit } from "@/lib/data/audit";
import { findValidSeal } from "@/lib/seals/find-valid-seal";
import { loadResponseLetter } from "@/lib/plan-review/load-response-letter";
import type { ActingUser } from "@/lib/data/users";
import { buildCheckRecord } from "./build-check-record";
import { computeCheckProgress } from "./compute-check-progress";
import { computeFingerprint } from "./compute-fingerprint";
import { describeUnfinishedCheck } from "./describe-unfinished-check";
import { loadReviewPackage } from "./load-review-package";
import { revisionLabel } from "./revision-label";
import { withTransaction } from "./with-transaction";

export type IssueRevisionOptions = { actor: ActingUser; packageId: string; trx?: Trx };

export type IssuedRevision = { id: string; number: number; label: string; fingerprint: string; issuedAt: Date };

/**
 * The project engineer issues the next revision, in one transaction: the
 * check is re-verified against the stored document, every calc is recomputed
 * here (browser results are never trusted), the document, results and check
 * record are frozen with a fingerprint, and the package becomes issued.
 */
export async function issueRevision({ actor, packageId, trx }: IssueRevisionOptions): Promise<IssuedRevision> {
  return withTransaction(trx, async (t) => {
    const { access, pkg } = await loadReviewPackage({ actor, packageId, permission: "revision.issue", refusal: "Only the project engineer (engineer of record) can issue a revision.", trx: t });
    if (pkg.status === "draft") throw new AppError("CONFLICT", "This package is a draft; submit it for check and have every calc checked before issuing.");
    if (pkg.status === "issued") throw new AppError("CONFLICT", "This package is already issued; start the next revision to issue again.");
    const progress = await computeCheckProgress({ packageId: pkg.id, document: pkg.document, trx: t });
    if (!progress.complete) throw new AppError("CONFLICT", `This package cannot be issued: ${describeUnfinishedCheck({ progress })}`);
    // The issuer's own seal, frozen into the revision as it is today.
    const sealCheck = await findValidSeal({ actor, trx: t });
    if (!sealCheck.valid) throw new AppError("CONFLICT", `You need a valid seal profile to issue: ${sealCheck.reason}.`);
    const seal = sealCheck.seal;
    // The answer to the permit office's comments on the previous revision travels with this one, frozen as it reads now.
    const answering = await loadResponseLetter({ packageId: pkg.id, document: pkg.document, trx: t });
    if (answering && answering.problems.length > 0) throw new AppError("CONFLICT", `This package cannot be issued: ${answering.problems[0]}${answering.problems.length > 1 ? ` (and ${answering.problems.length - 1} more)` : ""}`);
    const responseLetter = answering?.letter ?? null;

    const evaluation = evaluateCalcs({ calcs: extractCalcs(pkg.document) });
    const results = JSON.parse(JSON.stringify(evaluation.results)) as unknown;
    const checkRecord = await buildCheckRecord({ packageId: pkg.id, progress, trx: t });
    const last = await t.from("revisions").where({ packageId: pkg.id }).max<{ max: number | null }[]>({ max: "number" });
    const number = last[0].max === null ? 0 : last[0].max + 1;
    const label = revisionLabel({ scheme: access.project.revisionScheme, number });
    const fingerprint = computeFingerprint({ document: pkg.document, results, checkRecord, number, seal, responseLetter });
    const [row] = await t
      .insert({ packageId: pkg.id, number, label, document: JSON.stringify(pkg.document), results: JSON.stringify(results), checkRecord: JSON.stringify(checkRecord), issuedBy: actor.id, issuedAt: t.fn.now(), fingerprint, seal: JSON.stringify(seal), responseLetter: responseLetter ? JSON.stringify(responseLetter) : null })
      .into("revisions")
      .returning(["id", "issuedAt"]);
    await t.from("packages").where({ id: pkg.id }).update({ status: "issued", updatedAt: t.fn.now() });
    await recordAudit(
      { firmId: actor.firmId, actorId: actor.id, action: "revision.issue", entityType: "revision", entityId: row.id, projectId: pkg.projectId, data: { packageId: pkg.id, number, label, fingerprint } },
      t,
    );
    notifyAfterCommit(t, { kind: "issued", packageId: pkg.id, revisionId: row.id as string, actorId: actor.id });
    return { id: row.id as string, number, label, fingerprint, issuedAt: row.issuedAt as Date };
  });
}
