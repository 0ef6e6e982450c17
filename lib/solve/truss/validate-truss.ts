import { SolveError } from "../errors";
import type { TrussModel } from "../types";
import { checkMemberGeometry } from "./check-member-geometry";
import { checkReferences } from "./check-references";
import { describeZodIssue } from "./describe-zod-issue";
import { indexTruss } from "./index-truss";
import { trussModelSchema } from "./truss-schema";

/**
 * Checks anything claiming to be a truss model and returns a clean copy
 * (unknown fields dropped). Throws `SolveError("INVALID", …, { path })` at the
 * first offending field, e.g. `members[3].end`: shape and finite numbers
 * first, then ids and references, then geometry (zero-length or overlapping
 * members). Stability is not judged here; see `countTruss`.
 */
export function validateTruss(model: unknown): TrussModel {
  const parsed = trussModelSchema.safeParse(model, { reportInput: true });
  if (!parsed.success) {
    const { path, message } = describeZodIssue(parsed.error.issues[0]);
    throw new SolveError("INVALID", message, { path });
  }
  const clean: TrussModel = parsed.data;
  checkReferences(clean);
  checkMemberGeometry(clean, indexTruss(clean));
  return clean;
}
