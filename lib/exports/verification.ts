import { notFound } from "@/lib/app-error";
import { findVerification } from "@/lib/data/exports";

/** What the public verification page shows about an issued, signed file — and nothing else. */
export type Verification = {
  projectName: string;
  jobNumber: string;
  packageTitle: string;
  revisionLabel: string;
  issuer: string;
  issuedAt: string;
  /** The package fingerprint frozen with the revision. */
  fingerprint: string;
  /** SHA-256 of the signed PDF as issued. */
  sha256: string;
};

export async function lookUpVerification(token: string): Promise<Verification> {
  const row = await findVerification(token);
  if (!row) throw notFound("Verification");
  return {
    projectName: row.projectName,
    jobNumber: row.jobNumber,
    packageTitle: row.packageTitle,
    revisionLabel: row.revisionLabel,
    issuer: row.issuer,
    issuedAt: new Date(row.issuedAt).toISOString(),
    fingerprint: row.fingerprint,
    sha256: row.sha256,
  };
}

export type FileComparison = { identical: boolean; message: string; expectedSha256: string; givenSha256: string };

/** Whether a file's SHA-256 is the issued file's: byte-identical, or not. */
export async function compareWithIssued(token: string, sha256: string): Promise<FileComparison> {
  const v = await lookUpVerification(token);
  const given = sha256.toLowerCase();
  const identical = given === v.sha256.toLowerCase();
  return {
    identical,
    message: identical ? "Byte-identical to the issued file." : "NOT identical to the issued file: this copy differs from what was issued.",
    expectedSha256: v.sha256,
    givenSha256: given,
  };
}
