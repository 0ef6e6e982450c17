import { db } from "@/db/knex";
import type { FirmRole } from "@/lib/access/roles";
import { AppError } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import { updateFirmMember as patchFirmMember } from "@/lib/data/firm-members";
import type { ActingUser } from "@/lib/data/users";

export type UpdateFirmMemberOptions = { actor: ActingUser; userId: string; role?: FirmRole; disabled?: boolean };

export async function updateFirmMember({ actor, userId, role, disabled }: UpdateFirmMemberOptions): Promise<void> {
  // An admin locking themselves out would leave the firm without anyone to undo it.
  if (userId === actor.id && (disabled || role === "member")) {
    throw new AppError("CONFLICT", "You cannot disable yourself or give up your own admin role; ask another admin.");
  }
  await db().transaction(async (trx) => {
    await patchFirmMember({ actor, userId, role, disabled }, trx);
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "firm.member.update", entityType: "user", entityId: userId, data: { role, disabled } }, trx);
  });
}
