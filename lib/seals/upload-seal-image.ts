import { createHash } from "node:crypto";
import type { DbOrTrx } from "@/db/knex";
import { AppError } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import { upsertSealProfile } from "@/lib/data/seal-profiles";
import type { ActingUser } from "@/lib/data/users";
import { putObject } from "@/lib/storage/put-object";
import { sanitizeSealSvg } from "./sanitize-seal-svg";
import { sealContentType, sealImageKey } from "./seal-image-key";
import { sniffSealImage } from "./sniff-seal-image";

/** A seal is a small stamp drawing; 512 KB leaves room for a high-resolution PNG (common practice for such uploads). */
export const MAX_SEAL_IMAGE_BYTES = 512 * 1024;

export type UploadSealImageOptions = { actor: Pick<ActingUser, "id" | "firmId">; bytes: Buffer; trx?: DbOrTrx };

export type StoredSealImage = { imageType: "png" | "svg"; imageSha256: string; imageBytes: number; imageKey: string };

/**
 * Stores the actor's own seal image: a PNG as sent, or an SVG after cleaning
 * (scripts, event handlers, foreignObject and external references removed).
 * The cleaned bytes are what is hashed and stored, so the hash a revision
 * freezes is the hash of the image it shows.
 */
export async function uploadSealImage({ actor, bytes, trx }: UploadSealImageOptions): Promise<StoredSealImage> {
  if (bytes.length === 0) throw new AppError("INVALID", "The file is empty.", "file");
  if (bytes.length > MAX_SEAL_IMAGE_BYTES) {
    throw new AppError("INVALID", `The seal image is ${Math.ceil(bytes.length / 1024)} KB; seal images may be at most 512 KB.`, "file");
  }
  const kind = sniffSealImage(bytes);
  if (typeof kind !== "string") throw new AppError("INVALID", kind.refused, "file");
  const stored = kind === "svg" ? Buffer.from(sanitizeSealSvg(bytes.toString("utf8")), "utf8") : bytes;
  const imageSha256 = createHash("sha256").update(stored).digest("hex");
  const imageKey = sealImageKey({ firmId: actor.firmId, userId: actor.id, sha256: imageSha256, type: kind });
  await putObject({ key: imageKey, body: stored, contentType: sealContentType[kind] });
  const image: StoredSealImage = { imageType: kind, imageSha256, imageBytes: stored.length, imageKey };
  await upsertSealProfile({ userId: actor.id, firmId: actor.firmId }, image, trx);
  await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "seal.image", entityType: "user", entityId: actor.id, data: { imageType: kind, imageSha256, imageBytes: stored.length } }, trx);
  return image;
}
