import { db, type DbOrTrx } from "@/db/knex";

/** A seal profile as stored; any field may still be missing while the engineer fills it in. */
export type SealProfileRow = {
  id: string;
  firmId: string;
  userId: string;
  name: string | null;
  licenceNumber: string | null;
  jurisdiction: string | null;
  /** ISO date (YYYY-MM-DD), read as text so no time zone can shift it by a day. */
  expiresOn: string | null;
  imageKey: string | null;
  imageType: "png" | "svg" | null;
  imageSha256: string | null;
  imageBytes: number | null;
  updatedAt: Date;
};

export type SealFields = { name: string; licenceNumber: string; jurisdiction: string; expiresOn: string };
export type SealImageFields = { imageKey: string; imageType: "png" | "svg"; imageSha256: string; imageBytes: number };

/** The acting user's own seal profile, scoped to their firm; undefined when they have none. */
export async function findSealProfile(owner: { userId: string; firmId: string }, trx: DbOrTrx = db()): Promise<SealProfileRow | undefined> {
  return trx
    .from("sealProfiles")
    .select("id", "firmId", "userId", "name", "licenceNumber", "jurisdiction", trx.raw("to_char(expires_on, 'YYYY-MM-DD') as expires_on"), "imageKey", "imageType", "imageSha256", "imageBytes", "updatedAt")
    .where({ userId: owner.userId, firmId: owner.firmId })
    .first();
}

/** Creates the profile or updates the given columns of it (one row per person). */
export async function upsertSealProfile(owner: { userId: string; firmId: string }, fields: Partial<SealFields & SealImageFields>, trx: DbOrTrx = db()): Promise<void> {
  await trx
    .insert({ userId: owner.userId, firmId: owner.firmId, ...fields })
    .into("sealProfiles")
    .onConflict("userId")
    .merge({ ...fields, updatedAt: trx.fn.now() });
}
