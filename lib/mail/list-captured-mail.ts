import { z } from "zod";
import { env } from "../env";

/**
 * Client of the fake SMTP server's HTTP listing (scripts/fake-smtp.ts), at MAIL_CAPTURE_URL.
 * Development and tests only: production mail goes to a real provider and is not listable.
 */
const capturedMail = z.object({
  id: z.string(),
  from: z.string(),
  /** Everyone the message was delivered to (the SMTP envelope: To, Cc and Bcc). */
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  /** ISO 8601. */
  date: z.string(),
  attachments: z.array(z.object({ filename: z.string(), contentType: z.string(), size: z.number() })),
});

export type CapturedMail = z.infer<typeof capturedMail>;

/** Every captured message, newest first. */
export async function listCapturedMail(): Promise<CapturedMail[]> {
  const res = await fetch(new URL("/messages", env().MAIL_CAPTURE_URL), { cache: "no-store" });
  if (!res.ok) throw new Error(`mail capture answered ${res.status} at ${env().MAIL_CAPTURE_URL}`);
  return z.array(capturedMail).parse(await res.json());
}

/** Empties the captured inbox (tests start from a known state). */
export async function clearCapturedMail(): Promise<void> {
  const res = await fetch(new URL("/messages", env().MAIL_CAPTURE_URL), { method: "DELETE" });
  if (!res.ok) throw new Error(`mail capture answered ${res.status} at ${env().MAIL_CAPTURE_URL}`);
}
