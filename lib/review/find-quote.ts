/** One textblock's text and the document position of its first character (leaf inline nodes count as one U+FFFC). */
export type TextRun = { start: number; text: string };

export type QuoteRange = { from: number; to: number };

/**
 * Where a remark's quoted words are now: the occurrence nearest to where they
 * last were, so a remark follows its text when words are added or removed
 * around it. Null when the words are gone — the remark is then detached.
 */
export function findQuote(runs: readonly TextRun[], quote: string, near: number): QuoteRange | null {
  if (!quote) return null;
  let best: QuoteRange | null = null;
  for (const run of runs) {
    for (let i = run.text.indexOf(quote); i !== -1; i = run.text.indexOf(quote, i + 1)) {
      const from = run.start + i;
      if (!best || Math.abs(from - near) < Math.abs(best.from - near)) best = { from, to: from + quote.length };
    }
  }
  return best;
}

type JsonNode = { type?: string; text?: string; content?: JsonNode[] };

const textblockTypes = new Set(["paragraph", "heading"]);

/** The text of every paragraph and heading of a stored document (positions are not needed on the server). */
export function textblocksOfJson(document: unknown): string[] {
  const out: string[] = [];
  const walk = (node: JsonNode) => {
    if (node.type && textblockTypes.has(node.type)) {
      out.push((node.content ?? []).map((c) => (c.type === "text" ? (c.text ?? "") : "\ufffc")).join(""));
      return;
    }
    for (const child of node.content ?? []) walk(child);
  };
  if (document && typeof document === "object") walk(document as JsonNode);
  return out;
}

/** Whether the quoted words of a text remark are still somewhere in the document. */
export function quoteInDocument(document: unknown, quote: string): boolean {
  return quote.length > 0 && textblocksOfJson(document).some((t) => t.includes(quote));
}
