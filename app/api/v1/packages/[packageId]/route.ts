import { notFound } from "@/lib/app-error";
import { findPackage } from "@/lib/data/packages";
import { route } from "@/lib/http/route";
import { deletePackage } from "@/lib/packages/delete-package";
import { renamePackage } from "@/lib/packages/rename-package";
import { packageParams, packageRenameInput } from "@/lib/validation/package-input";

// GET /api/v1/packages/:packageId — one package with its document
export const GET = route({ permission: "package.read", params: packageParams }, async ({ access, params }) => {
  const pkg = await findPackage(access!.project.id, params.packageId, { withDocument: true });
  if (!pkg) throw notFound("Package");
  return { package: pkg, role: access!.role };
});

// PATCH /api/v1/packages/:packageId — rename a package
export const PATCH = route({ permission: "package.edit", params: packageParams, body: packageRenameInput }, async ({ user, access, params, body }) => ({
  package: await renamePackage({ actor: user, projectId: access!.project.id, packageId: params.packageId, title: body.title }),
}));

// DELETE /api/v1/packages/:packageId — delete a package while it is a draft
export const DELETE = route({ permission: "package.delete", params: packageParams }, async ({ user, access, params }) => {
  await deletePackage({ actor: user, projectId: access!.project.id, packageId: params.packageId });
  return new Response(null, { status: 204 });
});
