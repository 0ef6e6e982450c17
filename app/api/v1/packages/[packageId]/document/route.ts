import { route } from "@/lib/http/route";
import { saveDocument } from "@/lib/packages/save-document";
import { packageParams, saveDocumentInput } from "@/lib/validation/package-input";

// PUT /api/v1/packages/:packageId/document — autosave: store the document if its version is current (else 409 with the newer one)
export const PUT = route({ permission: "package.edit", params: packageParams, body: saveDocumentInput }, async ({ user, access, params, body }) => {
  const result = await saveDocument({ actor: user, projectId: access!.project.id, packageId: params.packageId, version: body.version, document: body.document });
  if (!result.ok) {
    return Response.json(
      { error: { code: "CONFLICT", message: `${result.conflict.savedBy} saved a newer version of this package (version ${result.conflict.version}). Your text is kept.` }, current: result.conflict },
      { status: 409 },
    );
  }
  return { version: result.version, savedAt: result.savedAt };
});
