import { db } from "@/db/knex";
import { AppError } from "@/lib/app-error";
import { hashPassword, verifyPassword } from "@/lib/auth/password";
import { recordAudit } from "@/lib/data/audit";
import { findUserForSignin, setUserPassword, updateUserName, type ActingUser } from "@/lib/data/users";

export type UpdateAccountOptions = { actor: ActingUser; name?: string; currentPassword?: string; newPassword?: string };

export async function updateAccount({ actor, name, currentPassword, newPassword }: UpdateAccountOptions): Promise<void> {
  if (newPassword) {
    const user = await findUserForSignin(actor.email);
    const ok = user?.passwordHash && currentPassword ? await verifyPassword(currentPassword, user.passwordHash) : false;
    if (!ok) throw new AppError("INVALID", "The current password is not right.", "currentPassword");
  }
  const hash = newPassword ? await hashPassword(newPassword) : null;
  await db().transaction(async (trx) => {
    if (name) await updateUserName(actor.id, name, trx);
    if (hash) await setUserPassword(actor.id, hash, trx);
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "account.update", entityType: "user", entityId: actor.id, data: { name: Boolean(name), password: Boolean(hash) } }, trx);
  });
}
