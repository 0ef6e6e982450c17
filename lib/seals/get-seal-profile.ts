import { findSealProfile } from "@/lib/data/seal-profiles";
import type { ActingUser } from "@/lib/data/users";
import { sealValidity, todayUtc } from "./seal-validity";

/** The account page's and the API's view of one's own seal. */
export type SealProfileView = {
  name: string | null;
  licenceNumber: string | null;
  jurisdiction: string | null;
  expiresOn: string | null;
  image: { type: "png" | "svg"; sha256: string; bytes: number } | null;
  validity: { valid: true; expiresOn: string } | { valid: false; reason: string };
};

/** The actor's own seal profile with whether it can seal today; every field null when there is none yet. */
export async function getSealProfile({ actor, today = todayUtc() }: { actor: ActingUser; today?: string }): Promise<SealProfileView> {
  const p = await findSealProfile({ userId: actor.id, firmId: actor.firmId });
  const v = sealValidity(p, today);
  return {
    name: p?.name ?? null,
    licenceNumber: p?.licenceNumber ?? null,
    jurisdiction: p?.jurisdiction ?? null,
    expiresOn: p?.expiresOn ?? null,
    image: p?.imageKey && p.imageType && p.imageSha256 && p.imageBytes !== null ? { type: p.imageType, sha256: p.imageSha256, bytes: p.imageBytes } : null,
    validity: v.valid ? { valid: true, expiresOn: v.seal.expiresOn } : { valid: false, reason: v.reason },
  };
}
