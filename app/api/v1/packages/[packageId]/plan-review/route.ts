import { created, route } from "@/lib/http/route";
import { listComments } from "@/lib/plan-review/list-comments";
import { recordComments } from "@/lib/plan-review/record-comments";
import { planReviewParams, recordCommentsInput } from "@/lib/validation/plan-review-input";

// GET /api/v1/packages/:packageId/plan-review — the permit office's comments on each issued revision, with their responses
export const GET = route({ permission: "planReview.read", params: planReviewParams }, async ({ user, params }) => listComments({ actor: user, packageId: params.packageId }));

// POST /api/v1/packages/:packageId/plan-review — record comments on the latest issued revision: a pasted numbered list, or one comment
export const POST = route({ permission: "planReview.manage", params: planReviewParams, body: recordCommentsInput }, async ({ user, params, body }) =>
  created({ comments: await recordComments({ actor: user, packageId: params.packageId, input: body }) }),
);
