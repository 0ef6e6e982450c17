import type { z } from "zod";
import { calcKindNames } from "../calcs/calc-kind-names";
import { calcKinds, type CalcKind } from "../calcs/calc-types";
import { describeInputIssue } from "../calcs/describe-input-issue";
import { formatFieldPath, joinFieldPath } from "../calcs/format-field-path";

const KINDS: ReadonlySet<string> = new Set(calcKinds);

/**
 * The first problem of a refused document, in words, with the path to the
 * offending field: `content[3].type`, `content[2].attrs.colour`, or inside a
 * calc `content[4].attrs.inputs.members[3].end` (named by the calc's label).
 */
export function describeDocumentIssue(issue: z.core.$ZodIssue, document: unknown): { message: string; path?: string } {
  if (issue.code === "custom" && issue.params?.limit) return { message: issue.message, ...(issue.path.length ? { path: String(issue.path[0]) } : {}) };
  const segments = issue.path.filter((p): p is string | number => typeof p !== "symbol");
  const base = formatFieldPath(segments);
  const inputsAt = segments.indexOf("inputs");
  if (inputsAt > 0 && segments[inputsAt - 1] === "attrs") {
    const node = valueAt(document, segments.slice(0, inputsAt - 1));
    const field = formatFieldPath(segments.slice(inputsAt + 1));
    const what = describeNodeIssue(issue);
    const path = issue.code === "unrecognized_keys" ? joinFieldPath(base, issue.keys[0]) : base;
    const shownField = issue.code === "unrecognized_keys" ? joinFieldPath(field, issue.keys[0]) : field;
    return { message: `${calcName(node)} has invalid inputs${shownField ? ` at ${shownField}` : ""}: ${what}.`, path };
  }
  if (issue.code === "unrecognized_keys") {
    const owner = valueAt(document, segments);
    const inAttrs = segments[segments.length - 1] === "attrs";
    const node = inAttrs ? valueAt(document, segments.slice(0, -1)) : owner;
    const type = nodeType(node);
    const key = issue.keys[0];
    const path = joinFieldPath(base, key);
    const message = inAttrs ? `${path}: a ${type} node has no attribute "${key}".` : `${path}: "${key}" is not part of a ${type} ${isMarkPath(segments) ? "mark" : "node"}.`;
    return { message, path };
  }
  if (segments[segments.length - 1] === "type" && (issue.code === "invalid_union" || issue.code === "invalid_value")) {
    const found = valueAt(document, segments);
    const allowed = "options" in issue && Array.isArray(issue.options) ? issue.options : issue.code === "invalid_value" ? issue.values : [];
    const kind = isMarkPath(segments) ? "mark" : "node";
    const parent = nodeType(valueAt(document, segments.slice(0, -3)));
    const where = segments.length <= 2 ? "" : parent === "doc" ? " at the top level" : ` inside a ${parent}`;
    const list = allowed.map(String).join(", ");
    return { message: `${base}: ${found === undefined ? `a ${kind} needs a type` : `"${String(found)}" is not a ${kind} a package document may hold${where}`} (allowed: ${list}).`, path: base };
  }
  if (issue.code === "custom") return { message: `${base}: ${issue.message}.`, path: base };
  if (!base) return { message: 'The document must be TipTap JSON: an object { "type": "doc", "content": [ … ] }.' };
  return { message: `${base} ${describeInputIssue(issue)}.`, path: base };
}

function describeNodeIssue(issue: z.core.$ZodIssue): string {
  return issue.code === "unrecognized_keys" ? "this calc has no such field" : issue.code === "custom" ? issue.message : describeInputIssue(issue);
}

function calcName(node: unknown): string {
  const type = nodeType(node);
  const label = isRecord(node) && isRecord(node.attrs) && typeof node.attrs.label === "string" ? node.attrs.label : "?";
  return KINDS.has(type) ? `Calc ${label} (${calcKindNames[type as CalcKind]})` : `Calc ${label}`;
}

function nodeType(node: unknown): string {
  return isRecord(node) && typeof node.type === "string" ? node.type : "document";
}

function isMarkPath(segments: (string | number)[]): boolean {
  return segments.includes("marks");
}

function valueAt(root: unknown, segments: (string | number)[]): unknown {
  let v: unknown = root;
  for (const s of segments) {
    if (typeof s === "number" ? !Array.isArray(v) : !isRecord(v)) return undefined;
    v = (v as Record<string | number, unknown>)[s];
  }
  return v;
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}
