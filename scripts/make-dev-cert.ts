// `tsx scripts/make-dev-cert.ts`: a self-signed development signing certificate (PKCS#12) at
// SIGNING_P12_PATH, made once when missing. It proves only that a file is unchanged since it was
// signed here; no one trusts it, and production replaces it with the firm's own certificate.
import { existsSync, mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";
import forge from "node-forge";
import { env } from "@/lib/env";

const { SIGNING_P12_PATH: file, SIGNING_P12_PASSPHRASE: passphrase } = env();

if (existsSync(file)) {
  console.log(`signing certificate: ${file} (exists; a self-signed development certificate unless you replaced it)`);
  process.exit(0);
}

const keys = forge.pki.rsa.generateKeyPair({ bits: 2048, e: 0x10001 });
const cert = forge.pki.createCertificate();
cert.publicKey = keys.publicKey;
cert.serialNumber = "01" + forge.util.bytesToHex(forge.random.getBytesSync(15));
cert.validity.notBefore = new Date(Date.now() - 60_000);
cert.validity.notAfter = new Date(cert.validity.notBefore.getTime() + 3 * 365 * 24 * 3600 * 1000);
const subject = [
  // UTF8String ("&" is no PrintableString character), ASCII only: node-forge encodes UTF-8 twice when it
  // copies the issuer into the CMS signer info, and the signature would then name no certificate.
  { name: "commonName", value: "Kestrel & Vane Engineering - DEVELOPMENT SIGNING CERTIFICATE, not trusted", valueTagClass: forge.asn1.Type.UTF8 as unknown as forge.asn1.Class },
  { name: "organizationName", value: "Kestrel & Vane Engineering (fictional)", valueTagClass: forge.asn1.Type.UTF8 as unknown as forge.asn1.Class },
  { name: "countryName", value: "US" },
];
cert.setSubject(subject);
cert.setIssuer(subject);
cert.setExtensions([
  { name: "basicConstraints", cA: false },
  { name: "keyUsage", digitalSignature: true, nonRepudiation: true },
]);
cert.sign(keys.privateKey, forge.md.sha256.create());

const p12 = forge.pkcs12.toPkcs12Asn1(keys.privateKey, [cert], passphrase, { algorithm: "3des" });
mkdirSync(path.dirname(file), { recursive: true });
writeFileSync(file, Buffer.from(forge.asn1.toDer(p12).getBytes(), "binary"), { mode: 0o600 });
console.log(`signing certificate: generated a SELF-SIGNED DEVELOPMENT certificate at ${file} (not trusted by any PDF reader; replace it in production)`);
