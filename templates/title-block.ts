import type { ReportMeta } from "../lib/report/report-model";
import { escapeHtml } from "./escape-html";

const day = (iso: string | null | undefined) => escapeHtml((iso ?? "").slice(0, 10));

/**
 * The sheet foot as a <template> the paginator clones onto every sheet:
 * firm, project and job, subject, by/checked with dates, revision, "Sheet x
 * of y", the full package fingerprint (small, whole, so it can be searched
 * for), and the caution line. Slots are filled per sheet: data-slot.
 */
export function titleBlockTemplate(meta: ReportMeta): string {
  const rev = meta.revision ? `<span class="v rev">Rev ${escapeHtml(meta.revision.label)}</span>` : `<span class="v rev prelim">PRELIMINARY</span>`;
  const checked = meta.checkedBy ? `${escapeHtml(meta.checkedBy.name)} · <span class="nw">${day(meta.checkedBy.date)}</span>` : "—";
  const watermark = meta.revision ? "" : `<div class="pp-watermark">PRELIMINARY — NOT FOR CONSTRUCTION</div>`;
  return `<template id="pp-sheet-template"><div class="pp-sheet">${watermark}<div class="pp-frame"></div><footer class="pp-foot">
<div class="pp-tb">
<div><span class="k">Firm</span><span class="v firm">${escapeHtml(meta.firmName)}</span></div>
<div><span class="k">Project</span><span class="v">${escapeHtml(meta.projectName)}</span><span class="k" style="margin-top:2pt">Job number</span><span class="v">${escapeHtml(meta.jobNumber)}</span></div>
<div><span class="k">Subject</span><span class="v" data-slot="subject"></span><span class="k" style="margin-top:2pt">Package</span><span class="v">${escapeHtml(meta.packageTitle)}</span></div>
<div><div class="pair"><span class="k">By / date</span><span class="v">${escapeHtml(meta.preparedBy.name)} · <span class="nw">${day(meta.preparedBy.date)}</span></span></div><div class="pair"><span class="k">Checked / date</span><span class="v">${checked}</span></div></div>
<div><span class="k">Revision</span>${rev}<span data-slot="revmark"></span></div>
<div><span class="k">Sheet</span><span class="v sheetno" data-slot="sheet"></span></div>
<div class="fp"><span>Package fingerprint SHA-256 ${escapeHtml(meta.fingerprint)}</span><span>${meta.revision ? `Issued ${day(meta.revision.issuedAt)}` : `Draft printed ${day(meta.generatedAt)}`}</span></div>
</div>
<div class="pp-caution">${escapeHtml(meta.safetyText)}</div>
</footer></div></template>`;
}
