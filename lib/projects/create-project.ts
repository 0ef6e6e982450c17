import { db } from "@/db/knex";
import { AppError } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import { createProject as insertProject, jobNumberTaken, type Project } from "@/lib/data/projects";
import type { ActingUser } from "@/lib/data/users";
import type { ProjectCreateInput } from "@/lib/validation/project-input";

export type CreateProjectOptions = { actor: ActingUser; input: ProjectCreateInput };

/** A new project in the actor's firm, with the actor as its project engineer. */
export async function createProject({ actor, input }: CreateProjectOptions): Promise<Project> {
  return db().transaction(async (trx) => {
    if (await jobNumberTaken(actor.firmId, input.jobNumber, null, trx)) {
      throw new AppError("CONFLICT", `Job number ${input.jobNumber} is already used by another project of your firm.`, "jobNumber");
    }
    const project = await insertProject(actor, input, trx);
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "project.create", entityType: "project", entityId: project.id, projectId: project.id, data: { name: project.name, jobNumber: project.jobNumber } }, trx);
    return project;
  });
}
