import { renderTex } from "../components/math/render-tex";
import type { ReportRun } from "../lib/report/report-model";
import { escapeHtml } from "./escape-html";

/** TeX typeset by KaTeX on the server; a line KaTeX refuses is printed as its source, marked, never dropped. */
export function mathHtml(tex: string, display = false): string {
  const r = renderTex(tex, display);
  return r.ok ? r.html : `<code class="pp-fail" title="${escapeHtml(r.message)}">${escapeHtml(tex)}</code>`;
}

/** Inline runs as HTML: marks as elements, links as plain text with their address (a sheet cannot be clicked). */
export function runsHtml(runs: readonly ReportRun[]): string {
  return runs
    .map((run) => {
      if (run.type === "break") return "<br>";
      if (run.type === "math") return mathHtml(run.tex);
      let html = escapeHtml(run.text);
      if (run.code) html = `<code>${html}</code>`;
      if (run.bold) html = `<strong>${html}</strong>`;
      if (run.italic) html = `<em>${html}</em>`;
      if (run.sub) html = `<sub>${html}</sub>`;
      if (run.sup) html = `<sup>${html}</sup>`;
      if (run.href) html = `<a href="${escapeHtml(run.href)}">${html}</a>`;
      return html;
    })
    .join("");
}
