import { createExport } from "@/lib/exports/create-export";
import { listExports } from "@/lib/exports/list-exports";
import { route } from "@/lib/http/route";
import { createExportInput } from "@/lib/validation/export-input";
import { packageParams } from "@/lib/validation/package-input";

// GET /api/v1/packages/:packageId/exports — the export history, newest first, with progress and five-minute download links
export const GET = route({ permission: "export.read", params: packageParams }, async ({ params }) => ({
  exports: await listExports({ packageId: params.packageId }),
}));

// POST /api/v1/packages/:packageId/exports — queues a PDF or DOCX of the draft or of an issued revision (202 with the row)
export const POST = route({ permission: "export.create", params: packageParams, body: createExportInput }, async ({ user, access, params, body }) => {
  const row = await createExport({ actor: user, access: access!, packageId: params.packageId, format: body.format, revisionId: body.revisionId ?? null });
  return Response.json({ id: row.id, format: row.format, revisionId: row.revisionId, status: row.status, createdAt: row.createdAt }, { status: 202 });
});
