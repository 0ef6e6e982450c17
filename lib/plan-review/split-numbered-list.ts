/** One comment as the permit office numbered it. */
export type NumberedItem = { number: string; text: string };

export type SplitList = {
  items: NumberedItem[];
  /** Whether the paste carried its own numbering; when false the one item has number "1" and the caller may renumber it. */
  numbered: boolean;
  /** Text before the first numbered item (a letter's heading, "Reviewer: …"); kept apart so nothing pasted is silently lost. */
  preamble: string;
};

// The number itself: "1", "12", "2a", "3.1", "S-3", "S3", "A-12b". At most three digits per part, so a year never reads as one.
const NUMBER = String.raw`(?:[A-Z]{1,4}-?)?\d{1,3}(?:\.\d{1,3})*[a-z]?`;
// Words an office puts before the number: "Comment 4:", "Item 4.", "No. 4", "Comment #4 -".
const PREFIX = String.raw`(?:(?:comment|item|no\.)\s*(?:no\.\s*)?#?\s*|#\s*)`;

const forms: RegExp[] = [
  // (1) Show …   (2a) Verify …
  new RegExp(String.raw`^\(\s*(${NUMBER})\s*\)\s*(.*)$`),
  // Comment 4: …  Comment 4 - …  Comment 4. …  Comment 4 …
  new RegExp(String.raw`^${PREFIX}(${NUMBER})\s*(?:[.):]|\s[-–—])?\s+(.*)$`, "i"),
  new RegExp(String.raw`^${PREFIX}(${NUMBER})\s*[.):]?\s*$`, "i"),
  // 1. …  1) …  1.) …  1: …
  new RegExp(String.raw`^(${NUMBER})(?:\.\)|[.):])(?:\s+(.*)|$)`),
  // 1 - …  1 – …
  new RegExp(String.raw`^(${NUMBER})\s+[-–—]\s+(.*)$`),
  // 2.1 Provide … (a multi-level number needs no mark after it, but then the text must start with a capital,
  // so a wrapped line such as "3.5 m span …" stays where it is)
  new RegExp(String.raw`^(\d{1,3}(?:\.\d{1,3})+)\s+([A-Z].*)$`),
];

const BULLET = /^[-*•◦▪–]\s+/;

/** Where a numbered item starts on this (trimmed) line, or null. */
export function matchItemStart(line: string): NumberedItem | null {
  for (const pattern of forms) {
    const m = pattern.exec(line);
    if (m) return { number: m[1].replace(/\.$/, ""), text: (m[2] ?? "").trim() };
  }
  return null;
}

/**
 * Splits the permit office's comments, pasted as a numbered list, into one
 * item per number. A line that continues an item (wrapped text, an indented
 * sub-point, a bullet) stays with it: hard-wrapped lines are joined with a
 * space, bullets keep their own line, a blank line inside an item is a
 * paragraph break. Only lines no more indented than the first item can start
 * a new one, so "a) …" or "1. …" nested under an item stays inside it.
 */
export function splitNumberedList(paste: string): SplitList {
  const lines = paste.replace(/\r\n?/g, "\n").replace(/\t/g, "    ").replace(/\u00a0/g, " ").split("\n");
  const items: { number: string; lines: string[] }[] = [];
  const preamble: string[] = [];
  let baseIndent: number | null = null;

  for (const raw of lines) {
    const indent = raw.length - raw.trimStart().length;
    const line = raw.trim();
    const start = line && (baseIndent === null || indent <= baseIndent + 1) ? matchItemStart(line) : null;
    if (start) {
      baseIndent ??= indent;
      items.push({ number: start.number, lines: [start.text] });
    } else if (items.length > 0) {
      items[items.length - 1].lines.push(line);
    } else {
      preamble.push(line);
    }
  }

  if (items.length === 0) {
    const text = joinLines(preamble);
    return { items: text ? [{ number: "1", text }] : [], numbered: false, preamble: "" };
  }
  return { items: items.map((i) => ({ number: i.number, text: joinLines(i.lines) })).filter((i) => i.text !== ""), numbered: true, preamble: joinLines(preamble) };
}

/** Wrapped lines joined with a space; bullets on their own line; blank lines as one paragraph break. */
function joinLines(lines: string[]): string {
  let out = "";
  let pendingBreak = false;
  for (const line of lines) {
    if (!line) {
      pendingBreak = out !== "";
      continue;
    }
    const bullet = BULLET.test(line);
    const piece = bullet ? `- ${line.replace(BULLET, "")}` : line;
    if (!out) out = piece;
    else if (pendingBreak) out += `\n\n${piece}`;
    else out += bullet ? `\n${piece}` : ` ${piece}`;
    pendingBreak = false;
  }
  return out.trim();
}

