import { SolveError } from "../errors";
import type { TrussModel } from "../types";
import { checkMemberGeometry } from "./check-member-geometry";
import { checkReferences } from "./check-references";
import { checkValues } from "./check-values";
import { describeZodIssue } from "./describe-zod-issue";
import { indexTruss } from "./index-truss";
import { trussModelSchema } from "./truss-schema";

/**
 * Checks anything claiming to be a truss model and returns a clean copy
 * (unknown fields dropped). Throws `SolveError("INVALID", …, { path })` at the
 * first offending field, e.g. `members[3].end`: shape and finite numbers
 * first, then values (ids, magnitudes, A and E), then references, then
 * geometry (zero-length or overlapping members). Stability is not judged here; see `countTruss`.
 */
export function validateTruss(model: unknown): TrussModel {
  const parsed = trussModelSchema.safeParse(model);
  if (!parsed.success) {
    // Parse again with the offending inputs kept, which is slower but only happens on failure.
    const again = trussModelSchema.safeParse(model, { reportInput: true });
    const { path, message } = describeZodIssue((again.error ?? parsed.error).issues[0]);
    throw new SolveError("INVALID", message, { path });
  }
  const clean: TrussModel = parsed.data;
  checkValues(clean);
  const index = indexTruss(clean);
  checkReferences(clean, index);
  checkMemberGeometry(clean, index);
  return clean;
}
