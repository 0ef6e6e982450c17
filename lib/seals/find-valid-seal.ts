import type { DbOrTrx } from "@/db/knex";
import { findSealProfile } from "@/lib/data/seal-profiles";
import type { ActingUser } from "@/lib/data/users";
import { sealValidity, todayUtc, type SealValidity } from "./seal-validity";

export type FindValidSealOptions = { actor: ActingUser; /** YYYY-MM-DD; today in UTC unless given. */ today?: string; trx?: DbOrTrx };

/** The actor's own seal, ready to freeze into a revision, or why it cannot seal today. */
export async function findValidSeal({ actor, today = todayUtc(), trx }: FindValidSealOptions): Promise<SealValidity> {
  const profile = await findSealProfile({ userId: actor.id, firmId: actor.firmId }, trx);
  return sealValidity(profile, today);
}
