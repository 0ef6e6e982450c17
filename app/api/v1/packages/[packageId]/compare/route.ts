import { route } from "@/lib/http/route";
import { compareRevisions } from "@/lib/review/compare-revisions";
import { compareQuery } from "@/lib/validation/compare-input";
import { packageParams } from "@/lib/validation/package-input";

// GET /api/v1/packages/:packageId/compare?from=<revisionId>&to=<revisionId|draft> — calcs and text changed, remarks raised and closed between two revisions
export const GET = route({ permission: "revision.read", params: packageParams, query: compareQuery }, async ({ user, params, query }) => {
  const c = await compareRevisions({ actor: user, packageId: params.packageId, from: query.from, to: query.to });
  // The newer document is for the compare page; the API answers with the changes only.
  return { from: c.from, to: c.to, calcs: c.calcs, text: c.text, remarks: c.remarks };
});
