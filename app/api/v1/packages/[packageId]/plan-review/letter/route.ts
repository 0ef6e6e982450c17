import { route } from "@/lib/http/route";
import { getResponseLetter } from "@/lib/plan-review/get-response-letter";
import { planReviewParams } from "@/lib/validation/plan-review-input";

// GET /api/v1/packages/:packageId/plan-review/letter — the response letter as the current draft would send it, and what still blocks it
export const GET = route({ permission: "planReview.read", params: planReviewParams }, async ({ user, params }) => getResponseLetter({ actor: user, packageId: params.packageId }));
