import { route } from "@/lib/http/route";
import { closeRemark } from "@/lib/review/close-remark";
import { remarkParams } from "@/lib/validation/review-input";

// POST /api/v1/packages/:packageId/remarks/:remarkId/close — close a remark (its opener or the project engineer); answers the package's status
export const POST = route({ permission: "remark.close", params: remarkParams }, async ({ user, params }) =>
  closeRemark({ actor: user, packageId: params.packageId, remarkId: params.remarkId }),
);
