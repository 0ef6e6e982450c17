import { escapeTex } from "../latex";

// KaTeX warns on these characters in text mode; TeX spells them in ASCII.
const SPELLED: Record<string, string> = { "\u00a7": "\\S\\,", "\u2013": "--", "\u2014": "---", "\u03c8": "psi", "\u00d7": "x", "\u2264": "<=", "\u2265": ">=" };

/** Words for a `\text{}` box: TeX specials escaped, §, dashes, ψ, ×, ≤ and ≥ in ASCII spelling. */
export function texText(s: string): string {
  const body = escapeTex(s).replace(/\u00a7\s*|[\u2013\u2014\u03c8\u00d7\u2264\u2265]/g, (c) => SPELLED[c.trim()] ?? c);
  return `\\text{${body}}`;
}
