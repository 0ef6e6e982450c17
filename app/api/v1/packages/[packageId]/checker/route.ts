import { route } from "@/lib/http/route";
import { assignChecker } from "@/lib/review/assign-checker";
import { packageParams } from "@/lib/validation/package-input";
import { assignCheckerInput } from "@/lib/validation/review-input";

// PUT /api/v1/packages/:packageId/checker — the project engineer names the package's checker (a project member with the checker role)
export const PUT = route({ permission: "checker.assign", params: packageParams, body: assignCheckerInput }, async ({ user, params, body }) => {
  await assignChecker({ actor: user, packageId: params.packageId, checkerId: body.checkerId });
  return { assignedChecker: body.checkerId };
});
