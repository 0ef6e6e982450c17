import { escapeHtml } from "./escape-html";

/** The revision mark: a triangle with the revision label inside, printed beside revised calcs and in their sheets' title blocks. */
export function revisionMarkSvg(label: string): string {
  return `<span class="pp-revmark" title="Revised in this revision"><svg viewBox="0 0 26 24" aria-label="Revised, revision ${escapeHtml(label)}"><path d="M13 1.5 L24.5 22.5 H1.5 Z" fill="#fff" stroke="#a4452c" stroke-width="1.6" stroke-linejoin="round"/><text x="13" y="19" text-anchor="middle" font-family="PP Sans, sans-serif" font-weight="700" font-size="${label.length > 2 ? 7 : 10}" fill="#a4452c">${escapeHtml(label)}</text></svg></span>`;
}
