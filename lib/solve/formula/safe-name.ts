// A dotted reference `T1.F_U1L2` would read as property access; `$` cannot appear
// in a name the author writes, so `T1$F_U1L2` never collides with one of theirs.
const SEPARATOR = "$";

/** The identifier a name is bound to during evaluation (`T1.F_U1L2` → `T1$F_U1L2`). */
export function toSafeName(name: string): string {
  return name.replace(".", SEPARATOR);
}

/** The name as the author wrote it (`T1$F_U1L2` → `T1.F_U1L2`). */
export function fromSafeName(safe: string): string {
  return safe.replace(SEPARATOR, ".");
}

const DOTTED = /(?<![A-Za-z0-9_.])([A-Za-z][A-Za-z0-9_]*)\.([A-Za-z][A-Za-z0-9_]*)/g;

/** Rewrites every dotted reference in an expression to its safe identifier. */
export function rewriteReferences(expression: string): string {
  return expression.replace(DOTTED, (_, label: string, name: string) => `${label}${SEPARATOR}${name}`);
}

/** The dotted references (`T1.F_U1L2`) an expression reads, in order of first appearance. */
export function dottedReferences(expression: string): string[] {
  return [...new Set(Array.from(expression.matchAll(DOTTED), (m) => `${m[1]}.${m[2]}`))];
}
