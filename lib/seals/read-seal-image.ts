import { notFound } from "@/lib/app-error";
import { findSealProfile } from "@/lib/data/seal-profiles";
import type { ActingUser } from "@/lib/data/users";
import { getObject } from "@/lib/storage/get-object";
import { sealContentType } from "./seal-image-key";

export type ReadSealImageOptions = { actor: ActingUser };

/** The actor's own current seal image; only its owner reads it here. */
export async function readSealImage({ actor }: ReadSealImageOptions): Promise<{ body: Buffer; contentType: string }> {
  const profile = await findSealProfile({ userId: actor.id, firmId: actor.firmId });
  if (!profile?.imageKey || !profile.imageType) throw notFound("Seal image");
  const obj = await getObject(profile.imageKey);
  if (!obj) throw notFound("Seal image");
  return { body: obj.body, contentType: sealContentType[profile.imageType] };
}
