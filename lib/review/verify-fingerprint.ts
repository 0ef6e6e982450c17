import { computeFingerprint } from "./compute-fingerprint";
import type { Revision } from "./list-revisions";

export type VerifyFingerprintOptions = {
  /** `seal` is optional so rows read before the seal column existed still verify; a sealed revision needs it. */
  revision: Pick<Revision, "document" | "results" | "checkRecord" | "number" | "fingerprint"> & { seal?: Revision["seal"]; responseLetter?: Revision["responseLetter"] };
};

/** Recomputes a revision's fingerprint from its stored fields; `ok` when it equals the stored one. */
export function verifyFingerprint({ revision }: VerifyFingerprintOptions): { ok: boolean; stored: string; recomputed: string } {
  const recomputed = computeFingerprint({ document: revision.document, results: revision.results, checkRecord: revision.checkRecord, number: revision.number, seal: revision.seal, responseLetter: revision.responseLetter });
  return { ok: recomputed === revision.fingerprint, stored: revision.fingerprint, recomputed };
}
