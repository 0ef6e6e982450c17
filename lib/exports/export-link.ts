import { createHash, createHmac, timingSafeEqual } from "node:crypto";
import { env } from "@/lib/env";

/** How long a download link works: long enough to click, too short to pass around. */
export const EXPORT_LINK_SECONDS = 5 * 60;

function secret(): string {
  const e = env();
  // A separate key per purpose: a session secret should never double as a link-signing key.
  return e.EXPORT_LINK_SECRET ?? createHash("sha256").update(`panelpoint export links\0${e.NEXTAUTH_SECRET}`).digest("hex");
}

function mac(exportId: string, expires: number): string {
  return createHmac("sha256", secret()).update(`${exportId}.${expires}`).digest("base64url");
}

export type ExportLink = { url: string; expires: number; signature: string };

/** A download link valid for five minutes; the route still requires the signed-in member. */
export function signExportLink(exportId: string, now: Date = new Date()): ExportLink {
  const expires = Math.floor(now.getTime() / 1000) + EXPORT_LINK_SECONDS;
  const signature = mac(exportId, expires);
  return { url: `/api/v1/exports/${exportId}/download?expires=${expires}&signature=${signature}`, expires, signature };
}

export type LinkCheck = "valid" | "invalid" | "expired";

/** The signature is checked before the expiry, so a forged link is never told apart from a missing export. */
export function checkExportLink(exportId: string, expires: number, signature: string, now: Date = new Date()): LinkCheck {
  const want = Buffer.from(mac(exportId, expires));
  const got = Buffer.from(signature);
  if (want.length !== got.length || !timingSafeEqual(want, got)) return "invalid";
  return expires * 1000 < now.getTime() ? "expired" : "valid";
}
