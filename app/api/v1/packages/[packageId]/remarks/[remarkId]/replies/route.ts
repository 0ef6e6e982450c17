import { created, route } from "@/lib/http/route";
import { replyToRemark } from "@/lib/review/reply-to-remark";
import { remarkParams, replyInput } from "@/lib/validation/review-input";

// POST /api/v1/packages/:packageId/remarks/:remarkId/replies — reply to a remark (the author's answer marks it answered)
export const POST = route({ permission: "remark.reply", params: remarkParams, body: replyInput }, async ({ user, params, body }) =>
  created(await replyToRemark({ actor: user, packageId: params.packageId, remarkId: params.remarkId, text: body.text })),
);
