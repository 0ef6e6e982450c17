import { route } from "@/lib/http/route";
import { updateProject } from "@/lib/projects/update-project";
import { projectParams, projectUpdateInput } from "@/lib/validation/project-input";

// GET /api/v1/projects/:projectId — one project, with the caller's role on it
export const GET = route({ permission: "project.read", params: projectParams }, async ({ access }) => ({
  project: access!.project,
  role: access!.role,
}));

// PATCH /api/v1/projects/:projectId — change the project's particulars and settings
export const PATCH = route({ permission: "project.update", params: projectParams, body: projectUpdateInput }, async ({ user, params, body }) => ({
  project: await updateProject({ actor: user, projectId: params.projectId, input: body }),
}));
