import { created, route } from "@/lib/http/route";
import { createRemark } from "@/lib/review/create-remark";
import { listRemarks } from "@/lib/review/list-remarks";
import { packageParams } from "@/lib/validation/package-input";
import { createRemarkInput } from "@/lib/validation/review-input";

// GET /api/v1/packages/:packageId/remarks — every remark with its thread: open, then answered, then closed
export const GET = route({ permission: "package.read", params: packageParams }, async ({ user, params }) => ({
  remarks: await listRemarks({ actor: user, packageId: params.packageId }),
}));

// POST /api/v1/packages/:packageId/remarks — raise a remark on a calc, a range of text, or the whole package
export const POST = route({ permission: "remark.create", params: packageParams, body: createRemarkInput }, async ({ user, params, body }) =>
  created(await createRemark({ actor: user, packageId: params.packageId, text: body.text, calcId: body.calcId ?? null, anchor: body.anchor ?? null })),
);
