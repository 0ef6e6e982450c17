import { route } from "@/lib/http/route";
import { checkProgress } from "@/lib/review/check-progress";
import { packageParams } from "@/lib/validation/package-input";

// GET /api/v1/packages/:packageId/check-progress — n of m calcs checked, marks cleared by input changes, remarks still open
export const GET = route({ permission: "check.read", params: packageParams }, async ({ user, params }) =>
  checkProgress({ actor: user, packageId: params.packageId }),
);
