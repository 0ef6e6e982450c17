import { createHash } from "node:crypto";
import { canonicalJson } from "./canonical-json";

export type ComputeFingerprintOptions = { document: unknown; results: unknown; checkRecord: unknown; number: number };

/** SHA-256 (hex) of the canonical serialization of what a revision freezes; anyone with the stored fields can recompute it. */
export function computeFingerprint({ document, results, checkRecord, number }: ComputeFingerprintOptions): string {
  return createHash("sha256").update(canonicalJson({ document, results, checkRecord, number })).digest("hex");
}
