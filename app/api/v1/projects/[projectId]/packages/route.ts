import { listPackages } from "@/lib/data/packages";
import { created, route } from "@/lib/http/route";
import { createPackage } from "@/lib/packages/create-package";
import { packageCreateInput } from "@/lib/validation/package-input";
import { projectParams } from "@/lib/validation/project-input";

// GET /api/v1/projects/:projectId/packages — the project's calculation packages
export const GET = route({ permission: "package.list", params: projectParams }, async ({ params }) => ({
  packages: await listPackages(params.projectId),
}));

// POST /api/v1/projects/:projectId/packages — start a new package (a draft)
export const POST = route({ permission: "package.create", params: projectParams, body: packageCreateInput }, async ({ user, params, body }) =>
  created({ package: await createPackage({ actor: user, projectId: params.projectId, title: body.title }) }),
);
