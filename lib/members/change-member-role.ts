import { db } from "@/db/knex";
import type { ProjectRole } from "@/lib/access/roles";
import { AppError, notFound } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import { countProjectEngineers, findProjectMember, upsertProjectMember, type ProjectMember } from "@/lib/data/project-members";
import type { ActingUser } from "@/lib/data/users";

export type ChangeMemberRoleOptions = { actor: ActingUser; projectId: string; userId: string; role: ProjectRole };

export async function changeMemberRole({ actor, projectId, userId, role }: ChangeMemberRoleOptions): Promise<ProjectMember> {
  return db().transaction(async (trx) => {
    const member = await findProjectMember(projectId, userId, trx);
    if (!member) throw notFound("Project member");
    if (member.role === "project_engineer" && role !== "project_engineer" && (await countProjectEngineers(projectId, trx)) <= 1) {
      throw new AppError("CONFLICT", "A project needs at least one project engineer. Make someone else project engineer first.", "role");
    }
    await upsertProjectMember(projectId, userId, role, trx);
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "member.role", entityType: "user", entityId: userId, projectId, data: { from: member.role, to: role } }, trx);
    return { ...member, role };
  });
}
