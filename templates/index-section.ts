import { escapeHtml } from "./escape-html";
import { sectionTitle } from "./section-title";

/** One line of the index: what, how deep, and the anchor whose sheet the paginator writes in. */
export type IndexEntry = { title: string; level: 0 | 1 | 2 | 3; anchor: string };

/** The index: each entry one flow block, its sheet number filled in after pagination (data-target). */
export function indexSection(entries: IndexEntry[]): string {
  const rows = entries
    .map((e) => `<div class="pp-b pp-index-row l${e.level}"><span>${escapeHtml(e.title)}</span><span class="dots"></span><span class="pp-index-sheet" data-target="${escapeHtml(e.anchor)}">—</span></div>`)
    .join("\n");
  return `${sectionTitle("index", "Index")}<div class="pp-b pp-muted" style="font-family:var(--font-ui);font-size:7.6pt">Sheet numbers refer to the “Sheet x of y” in each title block.</div>\n${rows}`;
}
