import type { ReportTable } from "../lib/report/report-model";
import { escapeHtml } from "./escape-html";

const cls = { left: "", right: "r", center: "c" } as const;

/**
 * A table as one flow block that the paginator may split by rows, repeating
 * its header row (data-split). `attrs` carries the block's flow attributes.
 */
export function tableBlock(t: ReportTable, attrs = "", cellHtml?: (cell: string, row: number, col: number) => string): string {
  const align = (i: number) => cls[t.align?.[i] ?? "left"];
  const head = `<thead><tr>${t.header.map((h, i) => `<th class="${align(i)}">${escapeHtml(h)}</th>`).join("")}</tr></thead>`;
  const body = t.rows
    .map((row, r) => `<tr>${row.map((cell, i) => `<td class="${align(i)}${cell === "NOT OK" ? " pp-fail" : cell === "OK" ? " pp-ok" : ""}">${cellHtml ? cellHtml(cell, r, i) : escapeHtml(cell)}</td>`).join("")}</tr>`)
    .join("");
  const narrow = t.header.length <= 3 ? " narrow" : "";
  const caption = t.caption ? `<div class="pp-caption">${escapeHtml(t.caption)}</div>` : "";
  return `<div class="pp-b pp-tablewrap" data-split="rows"${attrs}>${caption}<table class="pp-t${narrow}">${head}<tbody>${body}</tbody></table></div>`;
}
