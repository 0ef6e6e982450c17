import { execFile } from "node:child_process";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import { beforeAll, describe, expect, it } from "vitest";
import { loadSigningCertificate } from "@/lib/report/sign/load-signing-certificate";
import { signPdf } from "@/lib/report/sign/sign-pdf";
import { appendAnnotation } from "../support/append-annotation";
import { samplePdf } from "../support/sample-pdf";

const run = promisify(execFile);
const dir = mkdtempSync(path.join(tmpdir(), "pp-sign-"));

/** pdfsig's report (it exits non-zero for an invalid signature, so its output is read either way). */
async function pdfsig(file: Buffer, name: string): Promise<string> {
  const p = path.join(dir, name);
  writeFileSync(p, file);
  try {
    const { stdout } = await run("pdfsig", [p]);
    return stdout;
  } catch (e) {
    return String((e as { stdout?: string }).stdout ?? "") + String((e as { stderr?: string }).stderr ?? "");
  }
}

let cert: { p12: Buffer; passphrase: string };
let signed: Buffer;

beforeAll(async () => {
  // The self-signed development certificate scripts/test.sh makes (scripts/make-dev-cert.ts).
  cert = await loadSigningCertificate();
  signed = await signPdf(await samplePdf(3), { ...cert, name: "Kestrel & Vane Engineering", reason: "Issued KV-TEST Rev 0", location: "Testland", contactInfo: "http://localhost/verify/x" });
});

describe("signing an issued PDF", () => {
  it("gives a detached signature that poppler reports valid over the whole document", async () => {
    const report = await pdfsig(signed, "signed.pdf");
    expect(report).toContain("Signature Validation: Signature is Valid.");
    expect(report).toContain("Signature Type: adbe.pkcs7.detached");
    expect(report).toContain("Total document signed");
    expect(report).toContain("DEVELOPMENT SIGNING CERTIFICATE");
  });

  it("adds no encryption and no permission restrictions", () => {
    const text = signed.toString("latin1");
    expect(text).not.toMatch(/\/Encrypt\b/);
    expect(text).not.toMatch(/\/DocMDP\b/);
    expect(text).not.toMatch(/\/Perms\b/);
  });

  it("is no longer valid when one byte inside the signed range changes", async () => {
    const text = signed.toString("latin1");
    // A digit of a page's MediaBox (595 × 842): the file still parses, only its content changed.
    const at = text.indexOf("595");
    expect(at).toBeGreaterThan(0);
    const [, firstLength] = /\/ByteRange\s*\[\s*(\d+)\s+(\d+)/.exec(text)!.slice(1).map(Number);
    expect(at).toBeLessThan(firstLength);
    const tampered = Buffer.from(signed);
    tampered[at + 2] = "6".charCodeAt(0);
    const report = await pdfsig(tampered, "tampered.pdf");
    expect(report).not.toContain("Signature is Valid");
  });

  it("stays valid when a reviewer's annotation is appended as an incremental update", async () => {
    const annotated = appendAnnotation(signed, "Permit office: reviewed");
    expect(annotated.subarray(0, signed.length).equals(signed)).toBe(true);
    const report = await pdfsig(annotated, "annotated.pdf");
    expect(report).toContain("Signature Validation: Signature is Valid.");
    // The signature now covers the original revision only, and poppler says so.
    expect(report).not.toContain("Total document signed");
    // The annotation is really there: poppler's own reader sees the new object.
    const { stdout } = await run("pdfinfo", [path.join(dir, "annotated.pdf")]);
    expect(stdout).toMatch(/Pages:\s+3/);
    expect(readFileSync(path.join(dir, "annotated.pdf"), "latin1")).toContain("/Subtype /Text");
  });
});
