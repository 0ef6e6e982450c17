import { createHash } from "node:crypto";
import { canonicalJson } from "./canonical-json";

export type ComputeFingerprintOptions = {
  document: unknown;
  results: unknown;
  checkRecord: unknown;
  number: number;
  /** The frozen seal; covered only when present, so revisions issued before seals existed still verify. */
  seal?: unknown;
  /** The frozen plan-review response letter; covered only when present, so revisions without one still verify. */
  responseLetter?: unknown;
};

/** SHA-256 (hex) of the canonical serialization of what a revision freezes; anyone with the stored fields can recompute it. */
export function computeFingerprint({ document, results, checkRecord, number, seal, responseLetter }: ComputeFingerprintOptions): string {
  const covered = { document, results, checkRecord, number, ...(seal === undefined || seal === null ? {} : { seal }), ...(responseLetter === undefined || responseLetter === null ? {} : { responseLetter }) };
  return createHash("sha256").update(canonicalJson(covered)).digest("hex");
}
