import type { ReportBlock } from "../lib/report/report-model";
import { calcHtml } from "./calc-html";
import { escapeHtml } from "./escape-html";
import { runsHtml } from "./render-runs";

/** The narrative's blocks as flow blocks; level-1 headings name the sheets' subject from where they stand. */
export function narrativeHtml(blocks: readonly ReportBlock[], revisionLabel: string | null): string {
  return blocks.map((b) => topBlock(b, revisionLabel)).join("\n");
}

function topBlock(b: ReportBlock, revisionLabel: string | null): string {
  switch (b.type) {
    case "heading": {
      const subject = b.level === 1 ? ` data-subject="${escapeHtml(`${b.number} ${b.text}`)}"` : "";
      return `<div class="pp-b" id="${escapeHtml(b.anchor)}" data-keep="next"${subject}><h${b.level} class="pp-h${b.level}"><span class="pp-hnum">${escapeHtml(b.number)}</span>${escapeHtml(b.text)}</h${b.level}></div>`;
    }
    case "calc":
      return calcHtml(b.calc, revisionLabel);
    case "pageBreak":
      return `<div class="pp-b" data-break="before"></div>`;
    case "table":
      return `<div class="pp-b pp-tablewrap" data-split="rows">${tableHtml(b)}</div>`;
    default:
      return `<div class="pp-b">${innerHtml(b)}</div>`;
  }
}

function tableHtml(b: Extract<ReportBlock, { type: "table" }>): string {
  const head = b.header ? `<thead><tr>${b.header.map((c) => `<th>${runsHtml(c)}</th>`).join("")}</tr></thead>` : "";
  return `<table class="pp-t prose">${head}<tbody>${b.rows.map((r) => `<tr>${r.map((c) => `<td>${runsHtml(c)}</td>`).join("")}</tr>`).join("")}</tbody></table>`;
}

/** Blocks nested in lists and quotes, and the simple top-level ones. */
function innerHtml(b: ReportBlock): string {
  switch (b.type) {
    case "paragraph":
      return `<p>${runsHtml(b.runs)}</p>`;
    case "heading":
      return `<p><strong>${escapeHtml(`${b.number} ${b.text}`)}</strong></p>`;
    case "list": {
      const tag = b.ordered ? "ol" : "ul";
      const start = b.ordered && b.start !== 1 ? ` start="${b.start}"` : "";
      return `<${tag}${start}>${b.items.map((item) => `<li>${item.map(innerHtml).join("")}</li>`).join("")}</${tag}>`;
    }
    case "quote":
      return `<blockquote>${b.blocks.map(innerHtml).join("")}</blockquote>`;
    case "rule":
      return `<hr class="pp-rule">`;
    case "pageBreak":
      return "";
    case "figure": {
      const img = b.image && /^data:image\/(png|jpeg|gif|webp|svg\+xml);/.test(b.image.dataUri) ? `<img src="${escapeHtml(b.image.dataUri)}" alt="${escapeHtml(b.alt ?? b.caption ?? "Figure")}">` : `<div class="missing">Figure not available${b.alt ? `: ${escapeHtml(b.alt)}` : ""}</div>`;
      return `<figure class="pp-figure">${img}${b.caption ? `<figcaption>${escapeHtml(b.caption)}</figcaption>` : ""}</figure>`;
    }
    case "table":
      return tableHtml(b);
    case "calc":
      return `<p class="pp-muted">Calc ${escapeHtml(b.calc.label)} (see its own sheet).</p>`;
  }
}
