import type { DbOrTrx } from "@/db/knex";
import { AppError } from "@/lib/app-error";
import { formatPath } from "@/lib/http/error-response";
import { recordAudit } from "@/lib/data/audit";
import { upsertSealProfile } from "@/lib/data/seal-profiles";
import type { ActingUser } from "@/lib/data/users";
import { sealProfileInput } from "@/lib/validation/seal-input";

export type SaveSealProfileOptions = { actor: Pick<ActingUser, "id" | "firmId">; input: unknown; trx?: DbOrTrx };

/**
 * Saves the text of the actor's own seal profile. Validated here as well as in
 * the route, so every caller (the seed, tests) gets the same field-named
 * errors. An expiry date in the past is accepted: the profile records the
 * licence as it is, and issuing refuses it until it is renewed.
 */
export async function saveSealProfile({ actor, input, trx }: SaveSealProfileOptions): Promise<void> {
  const parsed = sealProfileInput.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const path = formatPath(issue.path);
    throw new AppError("INVALID", `${path ? `${path}: ` : ""}${issue.message}`, path || undefined);
  }
  await upsertSealProfile({ userId: actor.id, firmId: actor.firmId }, parsed.data, trx);
  await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "seal.update", entityType: "user", entityId: actor.id, data: { licenceNumber: parsed.data.licenceNumber, jurisdiction: parsed.data.jurisdiction, expiresOn: parsed.data.expiresOn } }, trx);
}
