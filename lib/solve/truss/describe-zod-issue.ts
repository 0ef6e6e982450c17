import type { z } from "zod";
import { formatPath } from "./format-path";

const NOUNS: Record<string, string> = {
  number: "a finite number",
  string: "text",
  array: "a list",
  object: "an object",
  tuple: "a pair of numbers",
};

const LIST_NOUNS: Record<string, [string, string]> = {
  joints: ["joint", "joints"],
  members: ["member", "members"],
  supports: ["support", "supports"],
};

/** The first schema problem in plain words, with the field it concerns. */
export function describeZodIssue(issue: z.core.$ZodIssue): { path: string; message: string } {
  const path = formatPath(issue.path);
  const got = "input" in issue ? shown(issue.input) : "nothing";
  switch (issue.code) {
    case "invalid_type": {
      if (got === "nothing") return { path, message: `${path} is missing.` };
      const noun = NOUNS[issue.expected] ?? issue.expected;
      return { path, message: `${path} must be ${noun}, but it is ${got}.` };
    }
    case "too_small":
      if (issue.origin === "array") {
        const least = Number(issue.minimum);
        const count = got.replace("a list of ", "");
        const what = LIST_NOUNS[path];
        if (!what) return { path, message: `${path} needs at least ${least} entries, but it has ${count}.` };
        return { path, message: `A truss needs at least ${least} ${least === 1 ? what[0] : what[1]}; ${path} has ${count}.` };
      }
      return { path, message: `${path} is too short: ${issue.message}.` };
    case "too_big":
      return { path, message: `${path} is too long: ${issue.message}.` };
    case "invalid_value":
      return { path, message: `${path} must be one of ${issue.values.map((v) => `"${String(v)}"`).join(", ")}, but it is ${got}.` };
    case "custom":
      return { path, message: `${path} ${issue.message}.` };
    default:
      return { path, message: `${path} is not valid: ${issue.message}.` };
  }
}

function shown(value: unknown): string {
  if (value === undefined) return "nothing";
  if (value === null) return "null";
  if (typeof value === "number") return String(value);
  if (typeof value === "string") return value.length > 40 ? `text "${value.slice(0, 40)}…"` : `text "${value}"`;
  if (Array.isArray(value)) return `a list of ${value.length}`;
  return `a ${typeof value}`;
}
