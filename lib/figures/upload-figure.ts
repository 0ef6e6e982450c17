import { randomUUID } from "node:crypto";
import { AppError } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import type { ActingUser } from "@/lib/data/users";
import { putObject } from "@/lib/storage/put-object";
import { figureKey, figureSrc } from "./figure-key";
import { sniffImageType } from "./sniff-image-type";

/** Figures are photographs and sketches: 8 MB is a generous phone photo (common practice for upload limits). */
export const MAX_FIGURE_BYTES = 8 * 1024 * 1024;

export type UploadFigureOptions = { actor: ActingUser; projectId: string; packageId: string; bytes: Buffer };

/**
 * Stores an image for a package. The type is read from the bytes themselves,
 * not from the name or the browser's claim; only raster images are accepted
 * (SVG could carry script and is refused here).
 */
export async function uploadFigure({ actor, projectId, packageId, bytes }: UploadFigureOptions): Promise<{ src: string; contentType: string }> {
  if (bytes.length === 0) throw new AppError("INVALID", "The file is empty.", "file");
  if (bytes.length > MAX_FIGURE_BYTES) throw new AppError("INVALID", `The image is ${(bytes.length / 1048576).toFixed(1)} MB; figures may be at most 8 MB.`, "file");
  const contentType = sniffImageType(bytes);
  if (!contentType) throw new AppError("INVALID", "Only PNG, JPEG or WebP images can be figures.", "file");
  const id = randomUUID();
  await putObject({ key: figureKey(actor.firmId, packageId, id), body: bytes, contentType });
  await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "figure.upload", entityType: "package", entityId: packageId, projectId, data: { figure: id, bytes: bytes.length, contentType } });
  return { src: figureSrc(packageId, id), contentType };
}
