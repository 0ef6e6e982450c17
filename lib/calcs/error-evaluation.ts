import { isSolveError } from "../solve";
import { joinFieldPath } from "./format-field-path";
import { failedEvaluation, type KindEvaluation } from "./kind-evaluation";

/** How to read a thrown error for one call into the engineering core. */
export type ErrorEvaluationOptions = {
  /**
   * Top-level fields of the calc's own inputs that the core's paths may name
   * (`loadCase`, `members`…). A SolveError on one of them becomes a field error;
   * any other path concerns something the calc reads, and becomes a message.
   */
  fields: readonly string[];
  /** Put in front of the core's path, e.g. `members[2]` for a per-row check. */
  prefix?: string;
  /** Where a field-less problem sits; default a message. */
  fallbackField?: string;
  /** Words put in front of a message about something read from elsewhere ("In T1: …"). */
  context?: string;
};

/**
 * Turns whatever the engineering core threw into a failed evaluation: invalid
 * inputs onto their field, an unstable truss or an unsolvable cut into a
 * message (or onto `fallbackField`), and anything unexpected into a message
 * with its own words.
 */
export function errorEvaluation<V>(error: unknown, options: ErrorEvaluationOptions, view: V | null = null): KindEvaluation<V> {
  if (isSolveError(error)) {
    const path = error.path ?? "";
    const head = path.split(/[.[]/)[0];
    if (path && options.fields.includes(head)) {
      return failedEvaluation({ fieldErrors: [{ path: joinFieldPath(options.prefix ?? "", path), message: error.message }], view });
    }
    if (options.fallbackField && error.code !== "INVALID") {
      return failedEvaluation({ fieldErrors: [{ path: joinFieldPath(options.prefix ?? "", options.fallbackField), message: error.message }], view });
    }
    const where = path ? ` (${path})` : "";
    return failedEvaluation({ messages: [`${options.context ? `${options.context}: ` : ""}${error.message}${where}`], view });
  }
  const message = error instanceof Error ? error.message : String(error);
  return failedEvaluation({ messages: [message], view });
}
