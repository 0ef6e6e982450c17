import type { z } from "zod";
import { SolveError } from "../errors";

/**
 * Parses calc inputs with a zod schema and turns the first problem into a
 * SolveError("INVALID") naming the field, so the editor can point at it.
 */
export function parseInput<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const parsed = schema.safeParse(input);
  if (parsed.success) return parsed.data;
  const issue = parsed.error.issues[0];
  const path = formatPath(issue.path);
  const where = path || "input";
  throw new SolveError("INVALID", `${where}: ${describeIssue(issue)}`, { path: path || undefined });
}

/** `["actions", 0, "kind"]` → `actions[0].kind`. */
function formatPath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((out, part) => {
    if (typeof part === "number") return `${out}[${part}]`;
    const key = String(part);
    return out ? `${out}.${key}` : key;
  }, "");
}

function describeIssue(issue: z.core.$ZodIssue): string {
  switch (issue.code) {
    case "invalid_type":
      return issue.expected === "number" ? "must be a finite number" : `must be a ${issue.expected}`;
    case "too_small":
      if (issue.origin === "array") return `must have at least ${String(issue.minimum)} item(s)`;
      return issue.inclusive ? `must be at least ${String(issue.minimum)}` : `must be greater than ${String(issue.minimum)}`;
    case "too_big":
      return issue.inclusive ? `must be at most ${String(issue.maximum)}` : `must be less than ${String(issue.maximum)}`;
    case "invalid_value":
      return `must be one of ${issue.values.map((v) => JSON.stringify(v)).join(", ")}`;
    case "invalid_union":
      if (issue.discriminator && "options" in issue && issue.options?.length) {
        return `must be one of ${issue.options.map((v) => JSON.stringify(v)).join(", ")}`;
      }
      return "does not match any accepted form";
    default:
      return issue.message;
  }
}
