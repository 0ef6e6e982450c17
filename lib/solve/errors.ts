/** What went wrong, in words an engineer can act on. */
export type SolveErrorCode = "INVALID" | "UNSTABLE" | "UNSOLVABLE_CUT";

/**
 * The one error class the engineering core throws. `path` names the offending
 * input field (e.g. `members[3].end`) for INVALID; `joints` lists the joints
 * that can move for UNSTABLE.
 */
export class SolveError extends Error {
  readonly code: SolveErrorCode;
  readonly path?: string;
  readonly joints?: string[];

  constructor(code: SolveErrorCode, message: string, details: { path?: string; joints?: string[] } = {}) {
    super(message);
    this.name = "SolveError";
    this.code = code;
    this.path = details.path;
    this.joints = details.joints;
  }
}

export function isSolveError(e: unknown): e is SolveError {
  return e instanceof SolveError;
}
