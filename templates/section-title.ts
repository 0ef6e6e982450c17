import { escapeHtml } from "./escape-html";

/** A part of the package (index, criteria, …): starts a sheet and names the sheets' subject. */
export function sectionTitle(id: string, title: string): string {
  return `<div class="pp-b" id="${escapeHtml(id)}" data-break="before" data-keep="next" data-subject="${escapeHtml(title)}"><h1 class="pp-section-title">${escapeHtml(title)}</h1></div>`;
}

/** A small heading inside a part, kept with what follows. */
export function subTitle(text: string): string {
  return `<div class="pp-b pp-sub" data-keep="next">${escapeHtml(text)}</div>`;
}
