import { computeFingerprint } from "./compute-fingerprint";
import type { Revision } from "./list-revisions";

export type VerifyFingerprintOptions = { revision: Pick<Revision, "document" | "results" | "checkRecord" | "number" | "fingerprint"> };

/** Recomputes a revision's fingerprint from its stored fields; `ok` when it equals the stored one. */
export function verifyFingerprint({ revision }: VerifyFingerprintOptions): { ok: boolean; stored: string; recomputed: string } {
  const recomputed = computeFingerprint({ document: revision.document, results: revision.results, checkRecord: revision.checkRecord, number: revision.number });
  return { ok: recomputed === revision.fingerprint, stored: revision.fingerprint, recomputed };
}
