import type { MathNode } from "mathjs";
import { formulaMath } from "./formula-math";
import { rewriteReferences } from "./safe-name";

/** An expression tree from mathjs, or why the text cannot be read. */
export type ParsedExpression = { ok: true; node: MathNode } | { ok: false; message: string };

// Everything the syntax needs; the rest of mathjs's language (strings, matrices,
// `?:`, `%`, `!`, comparisons) is refused before it can mean something surprising.
const ALLOWED = /[^A-Za-z0-9_\s.+\-*/^(),]/;
const NON_DECIMAL = /(?<![A-Za-z0-9_.])0[xXbBoO][0-9A-Fa-f]/;

// The same lines are parsed on every keystroke; mathjs trees are never mutated here.
const cache = new Map<string, ParsedExpression>();
const CACHE_LIMIT = 5000;

/** Reads the right-hand side of a line (dotted references allowed) into a mathjs tree. */
export function parseExpression(expression: string): ParsedExpression {
  const hit = cache.get(expression);
  if (hit) return hit;
  const parsed = read(expression);
  if (cache.size >= CACHE_LIMIT) cache.clear();
  cache.set(expression, parsed);
  return parsed;
}

function read(expression: string): ParsedExpression {
  const bad = ALLOWED.exec(expression);
  if (bad) {
    const c = bad[0];
    return { ok: false, message: c === "=" ? "only one = per line" : `"${c}" is not part of the formula syntax` };
  }
  if (NON_DECIMAL.test(expression)) return { ok: false, message: "numbers are written in decimal" };
  try {
    return { ok: true, node: formulaMath.parse(rewriteReferences(expression)) };
  } catch (e) {
    const detail = (e instanceof Error ? e.message : String(e)).replace(/\s*\(char \d+\)\s*$/, "");
    return { ok: false, message: `cannot read the expression: ${detail.charAt(0).toLowerCase()}${detail.slice(1)}` };
  }
}
