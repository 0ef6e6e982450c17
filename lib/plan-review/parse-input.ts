import type { z } from "zod";
import { AppError } from "@/lib/app-error";
import { formatPath } from "@/lib/http/error-response";

/** Validates an operation's input here as well as in the route, so every caller gets the same field-named error. */
export function parseInput<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const parsed = schema.safeParse(input);
  if (parsed.success) return parsed.data;
  const issue = parsed.error.issues[0];
  const path = formatPath(issue.path);
  throw new AppError("INVALID", `${path ? `${path}: ` : ""}${issue.message}`, path || undefined);
}
