import { notFound } from "@/lib/app-error";
import type { ActingUser } from "@/lib/data/users";
import { getObject } from "@/lib/storage/get-object";
import { figureKey } from "./figure-key";

export type ReadFigureOptions = { actor: ActingUser; packageId: string; figureId: string };

/** The stored image; the caller has already checked the actor may read the package. */
export async function readFigure({ actor, packageId, figureId }: ReadFigureOptions): Promise<{ body: Buffer; contentType: string }> {
  const obj = await getObject(figureKey(actor.firmId, packageId, figureId));
  if (!obj) throw notFound("Figure");
  return { body: obj.body, contentType: obj.contentType ?? "application/octet-stream" };
}
