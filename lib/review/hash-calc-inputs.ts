import { createHash } from "node:crypto";
import { canonicalJson } from "./canonical-json";

export type HashCalcInputsOptions = { /** A calc's `inputs` attribute as stored in the document. */ inputs: unknown };

/** SHA-256 (hex) of a calc's canonical inputs: what a check mark is tied to. */
export function hashCalcInputs({ inputs }: HashCalcInputsOptions): string {
  return createHash("sha256").update(canonicalJson(inputs)).digest("hex");
}
