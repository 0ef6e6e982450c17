import { createHash, randomBytes } from "node:crypto";
import { db, type DbOrTrx } from "@/db/knex";
import type { ProjectRole } from "@/lib/access/roles";

export type NewInvitation = { firmId: string; userId: string; projectId: string | null; projectRole: ProjectRole | null; invitedBy: string };

// A week is long enough to read the mail after a site visit, short enough that a stale link dies (common practice).
const VALID_DAYS = 7;

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

/** Stores an invitation and returns the one-time token that goes into the e-mail. */
export async function createInvitation(o: NewInvitation, trx: DbOrTrx = db()): Promise<string> {
  const token = randomBytes(32).toString("base64url");
  await trx
    .insert({ ...o, tokenHash: hashToken(token), expiresAt: new Date(Date.now() + VALID_DAYS * 86_400_000) })
    .into("invitations");
  return token;
}

export type OpenInvitation = { id: string; userId: string; email: string; name: string; firmName: string; expiresAt: Date };

export async function findOpenInvitation(token: string, trx: DbOrTrx = db()): Promise<OpenInvitation | undefined> {
  return trx
    .from("invitations as i")
    .join("users as u", "u.id", "i.userId")
    .join("firms as f", "f.id", "i.firmId")
    .select("i.id", "i.userId", "u.email", "u.name", "f.name as firmName", "i.expiresAt")
    .where("i.tokenHash", hashToken(token))
    .whereNull("i.acceptedAt")
    .where("i.expiresAt", ">", new Date())
    .first();
}

export async function markInvitationAccepted(id: string, trx: DbOrTrx = db()): Promise<void> {
  await trx.from("invitations").where({ id }).update({ acceptedAt: trx.fn.now() });
}
