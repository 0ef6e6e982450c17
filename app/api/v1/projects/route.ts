import { listProjects } from "@/lib/data/projects";
import { created, route } from "@/lib/http/route";
import { createProject } from "@/lib/projects/create-project";
import { projectCreateInput } from "@/lib/validation/project-input";

// GET /api/v1/projects — the projects the signed-in person may see
export const GET = route({ permission: "project.list" }, async ({ user }) => ({ projects: await listProjects(user) }));

// POST /api/v1/projects — create a project; the creator becomes its project engineer
export const POST = route({ permission: "project.create", body: projectCreateInput }, async ({ user, body }) =>
  created({ project: await createProject({ actor: user, input: body }) }),
);
