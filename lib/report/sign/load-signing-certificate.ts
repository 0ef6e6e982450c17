import { readFile } from "node:fs/promises";
import path from "node:path";
import { env } from "@/lib/env";

export type SigningCertificate = { p12: Buffer; passphrase: string };

/**
 * The firm's signing certificate. One per installation for now (the firm
 * admin's certificate management comes later); in development it is the
 * self-signed certificate scripts/make-dev-cert.ts makes.
 */
export async function loadSigningCertificate(): Promise<SigningCertificate> {
  const e = env();
  const file = path.resolve(e.SIGNING_P12_PATH);
  try {
    return { p12: await readFile(file), passphrase: e.SIGNING_P12_PASSPHRASE };
  } catch {
    throw new Error(`No signing certificate at ${e.SIGNING_P12_PATH}; run \`npx tsx scripts/make-dev-cert.ts\` for a development one or set SIGNING_P12_PATH.`);
  }
}
