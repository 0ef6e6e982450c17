import { route } from "@/lib/http/route";
import { startNextRevision } from "@/lib/review/start-next-revision";
import { packageParams } from "@/lib/validation/package-input";

// POST /api/v1/packages/:packageId/next-revision — after an issue, open the next draft (the issued revision stays frozen)
export const POST = route({ permission: "package.edit", params: packageParams }, async ({ user, params }) => startNextRevision({ actor: user, packageId: params.packageId }));
