import { calcKindNames } from "../calcs/calc-kind-names";
import type { CalcNode, PackageEvaluation } from "../calcs/calc-types";
import { evaluateCalcs } from "../calcs/evaluate-calcs";
import { locateCalcs } from "../calcs/locate-calcs";
import { MAX_DOCUMENT_BYTES } from "./document-limits";
import { documentSchema } from "./document-schema";
import type { PackageDocument } from "./document-types";
import { describeDocumentIssue } from "./describe-document-issue";
import { tooLarge } from "./measure-document";

/** A calc that may be saved but is not yet computed (unstable, broken reference, waiting on another), for the save response. */
export type CalcNotice = { id: string; label: string; status: "error" | "blocked"; messages: string[] };

/** Outcome of {@link validatePackageDocument}. */
export type ValidatePackageDocumentResult =
  | { ok: true; document: PackageDocument; calcs: CalcNode[]; evaluation: PackageEvaluation; notices: CalcNotice[] }
  | { ok: false; code: "INVALID"; message: string; path?: string };

/**
 * What the server runs on every save: the document against the node schema
 * (a JSON string is accepted too and size-checked before parsing), then every
 * calc recomputed from its inputs. A calc with invalid inputs refuses the
 * document, naming the calc and the field; a calc that is merely unstable,
 * has a broken reference or waits on one is allowed (the author is mid-work)
 * and listed in `notices`. Returns the document as given. Never throws.
 */
export function validatePackageDocument(doc: unknown): ValidatePackageDocumentResult {
  let value = doc;
  if (typeof doc === "string") {
    // One UTF-16 unit is at least one byte, so the length alone refuses a huge paste without encoding it.
    if (doc.length > MAX_DOCUMENT_BYTES || new TextEncoder().encode(doc).length > MAX_DOCUMENT_BYTES) {
      return refuse(tooLarge(doc.length, false));
    }
    try {
      value = JSON.parse(doc);
    } catch (e) {
      return refuse(`The document is not valid JSON: ${e instanceof Error ? e.message : String(e)}.`);
    }
  }
  const parsed = documentSchema.safeParse(value);
  if (!parsed.success) {
    // Parse again keeping the offending values for the message; only a refused document pays for it.
    const again = documentSchema.safeParse(value, { reportInput: true });
    const { message, path } = describeDocumentIssue((again.error ?? parsed.error).issues[0], value);
    return refuse(message, path);
  }
  const document = value as PackageDocument;
  const located = locateCalcs(document);
  const calcs = located.map((l) => l.calc);
  const evaluation = evaluateCalcs({ calcs });
  const notices: CalcNotice[] = [];
  for (const { calc, path } of located) {
    const result = evaluation.results[calc.id];
    const first = result.fieldErrors[0];
    if (first) {
      const more = result.fieldErrors.length > 1 ? ` (${result.fieldErrors.length - 1} more problem${result.fieldErrors.length > 2 ? "s" : ""} in this calc)` : "";
      return refuse(`Calc ${calc.label} (${calcKindNames[calc.kind]}) has invalid inputs at ${first.path}: ${sentence(first.message)}${more}`, `${path}.attrs.inputs.${first.path}`);
    }
    if (result.status !== "ok") notices.push({ id: calc.id, label: calc.label, status: result.status, messages: result.messages });
  }
  return { ok: true, document, calcs, evaluation, notices };
}

/** A field message as the end of a sentence: "must be a finite number" → "must be a finite number.". */
function sentence(message: string): string {
  return /[.!?]$/.test(message) ? message : `${message}.`;
}

function refuse(message: string, path?: string): ValidatePackageDocumentResult {
  return { ok: false, code: "INVALID", message, ...(path ? { path } : {}) };
}
