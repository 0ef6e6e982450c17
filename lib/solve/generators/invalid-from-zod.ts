import type { z } from "zod";
import { SolveError } from "../errors";

/**
 * Turns the first zod issue into the engine's INVALID error, with `path`
 * naming the offending field in the engine's notation (`panels`,
 * `loads[2].joint`) so the editor can point at the input to change.
 */
export function invalidFromZod(error: z.ZodError, subject: string): SolveError {
  const issue = error.issues[0];
  // An unknown field is reported on the object; name the field itself instead.
  const keys = issue.code === "unrecognized_keys" ? issue.keys : [];
  const path = [...issue.path, ...keys.slice(0, 1)]
    .map((key, i) => (typeof key === "number" ? `[${key}]` : `${i > 0 ? "." : ""}${String(key)}`))
    .join("");
  const message = issue.code === "unrecognized_keys" ? "is not an option here" : issue.message;
  return new SolveError("INVALID", `${subject}: ${path ? `${path}: ` : ""}${message}`, { path: path || undefined });
}
