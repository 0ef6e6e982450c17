import type { ReportCalc } from "../lib/report/report-model";
import { escapeHtml } from "./escape-html";
import { tableBlock } from "./report-table";
import { mathHtml } from "./render-runs";
import { revisionMarkSvg } from "./revision-mark";

const statusText = { ok: "", error: "Not computed: see the messages", blocked: "Waiting on another calc" } as const;

/**
 * A calc as flow blocks: its header (kept with what follows), the input
 * tables, the diagram, each step of working, the governing results and any
 * messages. Every block carries the calc's label (and whether it is revised)
 * so the paginator can put the revision mark on the sheets that hold it.
 */
export function calcHtml(calc: ReportCalc, revisionLabel: string | null): string {
  const tag = ` data-calc="${escapeHtml(calc.label)}"${calc.revised ? ` data-revised="1"` : ""}`;
  const mark = calc.revised && revisionLabel ? revisionMarkSvg(revisionLabel) : "";
  const status = statusText[calc.status] ? `<span class="pp-calc-status pp-fail">${statusText[calc.status]}</span>` : "";
  const out: string[] = [
    `<div class="pp-b pp-calc-head" id="calc-${escapeHtml(calc.label)}" data-keep="next"${tag}><div class="pp-calc-bar"><span class="pp-calc-label">${escapeHtml(calc.label)}</span><span class="pp-calc-kind">${escapeHtml(calc.kindName)}</span><span class="pp-calc-title">${escapeHtml(calc.title === calc.kindName ? "" : calc.title)}</span>${status}${mark}</div></div>`,
  ];
  for (const m of calc.messages) out.push(`<div class="pp-b"${tag}><div class="pp-msg">${escapeHtml(m)}</div></div>`);
  if (calc.inputs.length) {
    out.push(sub("Inputs and derived data", tag));
    for (const t of calc.inputs) out.push(tableBlock(t, tag));
  }
  // Inline mode (display-size fractions kept by \\displaystyle), so KaTeX may break a long line after its = and + signs.
  // The SVG is React's static markup of our own component (attribute values escaped by React).
  if (calc.diagramSvg) out.push(`<figure class="pp-b pp-diagram"${tag}>${calc.diagramSvg}</figure>`);
  if (calc.steps.length) {
    out.push(sub("Working", tag));
    for (const s of calc.steps) {
      const text = s.text ? `<div class="pp-step-text">${escapeHtml(s.text)}</div>` : "";
      out.push(`<div class="pp-b pp-step"${tag}>${text}<div class="pp-step-math">${mathHtml(`\\displaystyle ${s.latex}`)}</div></div>`);
    }
  }
  if (calc.results.length) {
    out.push(sub("Results", tag));
    const t = { caption: null, header: ["Quantity", "Name", "Value", "Unit"], rows: calc.results.map((r) => [r.tex, `${calc.label}.${r.name}`, r.value, r.unit]), align: ["left", "left", "right", "left"] as ("left" | "right")[] };
    out.push(tableBlock(t, tag, (cell, _r, col) => (col === 0 ? mathHtml(cell) : col === 1 ? `<code>${escapeHtml(cell)}</code>` : escapeHtml(cell))));
  } else if (calc.status !== "ok") {
    out.push(`<div class="pp-b pp-muted"${tag}>No results: this calc did not compute, for the reasons above.</div>`);
  }
  return out.join("\n");
}

function sub(text: string, tag: string): string {
  return `<div class="pp-b pp-sub" data-keep="next"${tag}>${escapeHtml(text)}</div>`;
}
