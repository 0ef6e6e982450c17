import { downloadExport } from "@/lib/exports/download-export";
import { route } from "@/lib/http/route";
import { downloadQuery, exportParams } from "@/lib/validation/export-input";

// GET /api/v1/exports/:exportId/download?expires=…&signature=… — the file, for a valid unexpired link and a member of the project (404 otherwise, 403 when expired)
export const GET = route({ permission: "export.download", params: exportParams, query: downloadQuery }, async ({ user, params, query }) => {
  const file = await downloadExport({ actor: user, exportId: params.exportId, expires: query.expires, signature: query.signature });
  return new Response(new Uint8Array(file.body), {
    headers: {
      "Content-Type": file.contentType,
      "Content-Length": String(file.body.length),
      "Content-Disposition": `attachment; filename="${file.fileName}"`,
      "Cache-Control": "private, no-store",
    },
  });
});
