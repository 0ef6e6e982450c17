import { route } from "@/lib/http/route";
import { markCalc } from "@/lib/review/mark-calc";
import { calcParams, markCalcInput } from "@/lib/validation/review-input";

// POST /api/v1/packages/:packageId/calcs/:calcId/check — the assigned checker marks one calc checked or returned
export const POST = route({ permission: "calc.check", params: calcParams, body: markCalcInput }, async ({ user, params, body }) =>
  markCalc({ actor: user, packageId: params.packageId, calcId: params.calcId, state: body.state }),
);
