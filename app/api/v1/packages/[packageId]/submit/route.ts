import { route } from "@/lib/http/route";
import { submitForCheck } from "@/lib/review/submit-for-check";
import { packageParams } from "@/lib/validation/package-input";

// POST /api/v1/packages/:packageId/submit — submit a draft for check (needs an assigned checker)
export const POST = route({ permission: "package.submit", params: packageParams }, async ({ user, params }) =>
  submitForCheck({ actor: user, packageId: params.packageId }),
);
