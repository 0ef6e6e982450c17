import type { z } from "zod";

/**
 * One zod issue in words an engineer can act on, without the field name (the
 * editor shows the message on the field itself).
 */
export function describeInputIssue(issue: z.core.$ZodIssue): string {
  switch (issue.code) {
    case "invalid_type":
      if (issue.input === undefined) return "is missing";
      return issue.expected === "number" ? "must be a finite number" : `must be ${article(issue.expected)}`;
    case "too_small":
      if (issue.origin === "array") return `needs at least ${String(issue.minimum)} ${Number(issue.minimum) === 1 ? "entry" : "entries"}`;
      if (issue.origin === "string") return Number(issue.minimum) === 1 ? "must not be empty" : `must be at least ${String(issue.minimum)} characters`;
      return issue.inclusive ? `must be at least ${String(issue.minimum)}` : `must be greater than ${String(issue.minimum)}`;
    case "too_big":
      if (issue.origin === "array") return `may have at most ${String(issue.maximum)} entries`;
      if (issue.origin === "string") return `may be at most ${String(issue.maximum)} characters`;
      return issue.inclusive ? `must be at most ${String(issue.maximum)}` : `must be less than ${String(issue.maximum)}`;
    case "invalid_value":
      return `must be one of ${issue.values.map((v) => JSON.stringify(v)).join(", ")}`;
    case "invalid_union":
      if ("options" in issue && Array.isArray(issue.options) && issue.options.length > 0) {
        return `must be one of ${issue.options.map((v) => JSON.stringify(v)).join(", ")}`;
      }
      return "does not match any accepted form";
    case "unrecognized_keys":
      return `has fields this calc does not know: ${issue.keys.join(", ")}`;
    case "invalid_format":
      return issue.message;
    default:
      return issue.message;
  }
}

function article(noun: string): string {
  if (noun === "array") return "a list";
  if (noun === "object") return "a group of fields";
  if (noun === "string") return "text";
  if (noun === "boolean") return "true or false";
  return /^[aeiou]/.test(noun) ? `an ${noun}` : `a ${noun}`;
}
