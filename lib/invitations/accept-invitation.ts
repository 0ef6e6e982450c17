import { db } from "@/db/knex";
import { AppError } from "@/lib/app-error";
import { hashPassword } from "@/lib/auth/password";
import { recordAudit } from "@/lib/data/audit";
import { findOpenInvitation, markInvitationAccepted } from "@/lib/data/invitations";
import { setUserPassword } from "@/lib/data/users";

export type AcceptInvitationOptions = { token: string; password: string };

/** Sets the invitee's password from the e-mailed link; the link then stops working. */
export async function acceptInvitation({ token, password }: AcceptInvitationOptions): Promise<{ email: string }> {
  const passwordHash = await hashPassword(password);
  return db().transaction(async (trx) => {
    const inv = await findOpenInvitation(token, trx);
    if (!inv) throw new AppError("NOT_FOUND", "This invitation link is not valid any more. Ask for a new one.");
    await setUserPassword(inv.userId, passwordHash, trx);
    await markInvitationAccepted(inv.id, trx);
    const firm = await trx.from("firmMemberships").select("firmId").where({ userId: inv.userId }).first();
    await recordAudit({ firmId: firm.firmId, actorId: inv.userId, action: "invitation.accept", entityType: "user", entityId: inv.userId }, trx);
    return { email: inv.email };
  });
}
