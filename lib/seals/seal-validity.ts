import type { SealProfileRow } from "@/lib/data/seal-profiles";

/** The seal a revision freezes: what the cover sheet's seal block shows, and which stored image it used. */
export type FrozenSeal = {
  name: string;
  licenceNumber: string;
  jurisdiction: string;
  expiresOn: string;
  imageKey: string;
  imageType: "png" | "svg";
  imageSha256: string;
};

export type SealValidity = { valid: true; seal: FrozenSeal } | { valid: false; reason: string };

/** Today's date in UTC as YYYY-MM-DD; licences expire by calendar date, so one fixed zone keeps every server in agreement. */
export function todayUtc(now: Date = new Date()): string {
  return now.toISOString().slice(0, 10);
}

const missingNames: [keyof SealProfileRow, string][] = [
  ["name", "your name"],
  ["licenceNumber", "your licence number"],
  ["jurisdiction", "the jurisdiction"],
  ["expiresOn", "the expiry date"],
  ["imageKey", "your seal image"],
];

/**
 * Whether a profile can seal on `today` (YYYY-MM-DD): every field present, an
 * image stored, and not expired (a seal is still good on its expiry date).
 * The reason completes "You need a valid seal profile to issue: …".
 */
export function sealValidity(profile: SealProfileRow | undefined, today: string): SealValidity {
  if (!profile) return { valid: false, reason: "you have no seal profile yet; add your name, licence number, jurisdiction, expiry date and seal image on your account page" };
  const missing = missingNames.filter(([k]) => profile[k] === null || profile[k] === "").map(([, label]) => label);
  if (missing.length > 0) return { valid: false, reason: `add ${joinList(missing)} on your account page` };
  const p = profile as { [K in keyof SealProfileRow]: NonNullable<SealProfileRow[K]> };
  if (p.expiresOn < today) return { valid: false, reason: `your seal expired on ${p.expiresOn}; renew it on your account page` };
  return {
    valid: true,
    seal: { name: p.name, licenceNumber: p.licenceNumber, jurisdiction: p.jurisdiction, expiresOn: p.expiresOn, imageKey: p.imageKey, imageType: p.imageType, imageSha256: p.imageSha256 },
  };
}

function joinList(items: string[]): string {
  if (items.length <= 1) return items.join("");
  return `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`;
}
