import { AppError } from "@/lib/app-error";
import { MAX_FIGURE_BYTES, uploadFigure } from "@/lib/figures/upload-figure";
import { created, route } from "@/lib/http/route";
import { packageParams } from "@/lib/validation/package-input";

// POST /api/v1/packages/:packageId/figures — upload an image (multipart field "file") for a figure
export const POST = route({ permission: "package.edit", params: packageParams }, async ({ req, user, access, params }) => {
  const length = Number(req.headers.get("content-length") ?? 0);
  if (length > MAX_FIGURE_BYTES + 64 * 1024) throw new AppError("INVALID", "Figures may be at most 8 MB.", "file");
  const form = await req.formData().catch(() => null);
  const file = form?.get("file");
  if (!file || typeof file === "string") throw new AppError("BAD_REQUEST", 'Send the image as multipart form data in a field named "file".', "file");
  const bytes = Buffer.from(await file.arrayBuffer());
  return created(await uploadFigure({ actor: user, projectId: access!.project.id, packageId: params.packageId, bytes }));
});
