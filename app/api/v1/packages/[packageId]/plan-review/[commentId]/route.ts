import { route } from "@/lib/http/route";
import { deleteComment } from "@/lib/plan-review/delete-comment";
import { updateComment } from "@/lib/plan-review/update-comment";
import { planReviewCommentParams, updateCommentInput } from "@/lib/validation/plan-review-input";

// PATCH /api/v1/packages/:packageId/plan-review/:commentId — write the response, link where the draft answers it, or correct the comment
export const PATCH = route({ permission: "planReview.manage", params: planReviewCommentParams, body: updateCommentInput }, async ({ user, params, body }) =>
  updateComment({ actor: user, packageId: params.packageId, commentId: params.commentId, input: body }),
);

// DELETE /api/v1/packages/:packageId/plan-review/:commentId — remove a comment recorded by mistake (the audit log keeps it)
export const DELETE = route({ permission: "planReview.manage", params: planReviewCommentParams }, async ({ user, params }) => {
  await deleteComment({ actor: user, packageId: params.packageId, commentId: params.commentId });
  return new Response(null, { status: 204 });
});
