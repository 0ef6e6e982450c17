import katex from "katex";
import { LruCache } from "./lru-cache";

export type TexRender = { ok: true; html: string } | { ok: false; message: string };

/**
 * Enough for every distinct line on screen in a large package plus the lines
 * of the last few edits; a typeset line is a few kilobytes of HTML.
 */
const CAPACITY = 1000;
const cache = new LruCache<string, TexRender>(CAPACITY);

/**
 * LaTeX to HTML with KaTeX, memoised by source: calcs re-render on every
 * keystroke while most of their lines are unchanged, and typesetting is the
 * costly part. Failures are cached too, so a broken line costs one attempt.
 *
 * KaTeX is asked to throw (throwOnError: true) and the error is caught here:
 * with throwOnError false it would never throw, but draw the bad source in red
 * inline, and we could not show our own error box with the message. `trust`
 * stays false, so commands such as \href or \htmlClass cannot inject markup.
 */
export function renderTex(latex: string, display = false): TexRender {
  const key = `${display ? "D" : "I"}${latex}`;
  const hit = cache.get(key);
  if (hit) return hit;
  const result = typeset(latex, display);
  cache.set(key, result);
  return result;
}

function typeset(latex: string, display: boolean): TexRender {
  try {
    // `strict: "ignore"`: the warnings are about LaTeX compatibility of input that only KaTeX will ever typeset.
    // `fleqn`: display lines flush left, as working is laid out on a calculation sheet.
    const html = katex.renderToString(latex, { displayMode: display, fleqn: display, throwOnError: true, strict: "ignore", trust: false });
    return { ok: true, html };
  } catch (error) {
    // KaTeX's message quotes the source near the fault (underlined); the "KaTeX parse error:" prefix says nothing to an engineer.
    if (error instanceof katex.ParseError) return { ok: false, message: error.message.replace(/^KaTeX parse error:\s*/, "") };
    if (error instanceof Error) return { ok: false, message: error.message };
    return { ok: false, message: String(error) };
  }
}

/** For tests and for freeing memory when a package is closed. */
export function clearTexCache(): void {
  cache.clear();
}

/** How many typeset lines are held. */
export function texCacheSize(): number {
  return cache.size;
}
