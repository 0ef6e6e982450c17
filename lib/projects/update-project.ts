import { db } from "@/db/knex";
import { AppError } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import { jobNumberTaken, updateProject as patchProject, type Project } from "@/lib/data/projects";
import type { ActingUser } from "@/lib/data/users";
import type { ProjectUpdateInput } from "@/lib/validation/project-input";

export type UpdateProjectOptions = { actor: ActingUser; projectId: string; input: ProjectUpdateInput };

export async function updateProject({ actor, projectId, input }: UpdateProjectOptions): Promise<Project> {
  return db().transaction(async (trx) => {
    if (input.jobNumber && (await jobNumberTaken(actor.firmId, input.jobNumber, projectId, trx))) {
      throw new AppError("CONFLICT", `Job number ${input.jobNumber} is already used by another project of your firm.`, "jobNumber");
    }
    const project = await patchProject(projectId, input, trx);
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "project.update", entityType: "project", entityId: projectId, projectId, data: { fields: Object.keys(input) } }, trx);
    return project;
  });
}
