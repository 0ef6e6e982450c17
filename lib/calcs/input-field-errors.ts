import type { z } from "zod";
import type { CalcFieldError } from "./calc-types";
import { describeInputIssue } from "./describe-input-issue";
import { formatFieldPath, joinFieldPath } from "./format-field-path";

/** At most this many problems per calc: enough to fix a paste, not a wall of red. */
const MAX_FIELD_ERRORS = 20;

/**
 * The zod issues of a calc's inputs as field errors. An unknown field is
 * reported on its own path (`members[2].colour`), so the editor can point at it.
 */
export function inputFieldErrors(error: z.ZodError): CalcFieldError[] {
  const out: CalcFieldError[] = [];
  for (const issue of error.issues) {
    const base = formatFieldPath(issue.path);
    if (issue.code === "unrecognized_keys") {
      for (const key of issue.keys) out.push({ path: joinFieldPath(base, key), message: "is not a field of this calc" });
    } else {
      out.push({ path: base, message: describeInputIssue(issue) });
    }
    if (out.length >= MAX_FIELD_ERRORS) break;
  }
  return out.slice(0, MAX_FIELD_ERRORS);
}
