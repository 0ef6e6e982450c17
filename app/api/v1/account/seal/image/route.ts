import { AppError } from "@/lib/app-error";
import { route } from "@/lib/http/route";
import { getSealProfile } from "@/lib/seals/get-seal-profile";
import { readSealImage } from "@/lib/seals/read-seal-image";
import { MAX_SEAL_IMAGE_BYTES, uploadSealImage } from "@/lib/seals/upload-seal-image";

// GET /api/v1/account/seal/image — one's own current seal image (PNG, or the cleaned SVG)
export const GET = route({ permission: "seal.read" }, async ({ user }) => {
  const { body, contentType } = await readSealImage({ actor: user });
  // The SVG is already cleaned; the CSP keeps it inert even if opened directly.
  return new Response(new Uint8Array(body), {
    headers: { "content-type": contentType, "cache-control": "private, no-cache", "x-content-type-options": "nosniff", "content-security-policy": "default-src 'none'; style-src 'unsafe-inline'; img-src data:" },
  });
});

// PUT /api/v1/account/seal/image — upload one's own seal image: the raw file as the body, or multipart field "file"; PNG or SVG, at most 512 KB
export const PUT = route({ permission: "seal.manage" }, async ({ req, user }) => {
  const length = Number(req.headers.get("content-length") ?? 0);
  if (length > MAX_SEAL_IMAGE_BYTES + 64 * 1024) throw new AppError("INVALID", "Seal images may be at most 512 KB.", "file");
  const bytes = await readUpload(req);
  await uploadSealImage({ actor: user, bytes });
  return { seal: await getSealProfile({ actor: user }) };
});

async function readUpload(req: Request): Promise<Buffer> {
  if (!(req.headers.get("content-type") ?? "").startsWith("multipart/form-data")) return Buffer.from(await req.arrayBuffer());
  const form = await req.formData().catch(() => null);
  const file = form?.get("file");
  if (!file || typeof file === "string") throw new AppError("BAD_REQUEST", 'Send the image as the request body, or as multipart form data in a field named "file".', "file");
  return Buffer.from(await file.arrayBuffer());
}
