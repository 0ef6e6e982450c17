import { created, route } from "@/lib/http/route";
import { issueRevision } from "@/lib/review/issue-revision";
import { listRevisions } from "@/lib/review/list-revisions";
import { verifyFingerprint } from "@/lib/review/verify-fingerprint";
import { packageParams } from "@/lib/validation/package-input";

// GET /api/v1/packages/:packageId/revisions — the issued revisions, oldest first, each with its fingerprint re-verified
export const GET = route({ permission: "revision.read", params: packageParams }, async ({ user, params }) => {
  const revisions = await listRevisions({ actor: user, packageId: params.packageId });
  return { revisions: revisions.map((revision) => ({ ...revision, fingerprintOk: verifyFingerprint({ revision }).ok })) };
});

// POST /api/v1/packages/:packageId/revisions — the project engineer issues the next revision (refused, with the reason, until the check is complete)
export const POST = route({ permission: "revision.issue", params: packageParams }, async ({ user, params }) =>
  created(await issueRevision({ actor: user, packageId: params.packageId })),
);
