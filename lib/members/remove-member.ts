import { db } from "@/db/knex";
import { AppError, notFound } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import { countProjectEngineers, findProjectMember, removeProjectMember } from "@/lib/data/project-members";
import type { ActingUser } from "@/lib/data/users";

export type RemoveMemberOptions = { actor: ActingUser; projectId: string; userId: string };

export async function removeMember({ actor, projectId, userId }: RemoveMemberOptions): Promise<void> {
  await db().transaction(async (trx) => {
    const member = await findProjectMember(projectId, userId, trx);
    if (!member) throw notFound("Project member");
    if (member.role === "project_engineer" && (await countProjectEngineers(projectId, trx)) <= 1) {
      throw new AppError("CONFLICT", "The last project engineer cannot be removed. Make someone else project engineer first.");
    }
    await removeProjectMember(projectId, userId, trx);
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "member.remove", entityType: "user", entityId: userId, projectId, data: { role: member.role } }, trx);
  });
}
