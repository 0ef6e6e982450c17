import { appendicesSection, checkRecordSection, responseLetterSection } from "../../../templates/back-sections";
import { coverSheet } from "../../../templates/cover-sheet";
import { criteriaSection, revisionLogSection } from "../../../templates/criteria-section";
import { embeddedFontCss, reportCss } from "../../../templates/embedded-fonts";
import { escapeHtml } from "../../../templates/escape-html";
import { indexSection } from "../../../templates/index-section";
import { narrativeHtml } from "../../../templates/narrative-html";
import { titleBlockTemplate } from "../../../templates/title-block";
import type { ReportModel } from "../report-model";
import { indexEntries } from "./index-entries";

/**
 * The package as one self-contained HTML document (fonts, KaTeX and images
 * inlined): the flow of blocks in sheet order — cover, index, design
 * criteria, revision log, narrative and calcs, check record, response letter,
 * appendices — and the sheet template with its title block. It is not yet
 * paginated: lib/report/pdf runs templates/paginate-sheets.js in Chromium,
 * which flows the blocks into fixed-size sheets and numbers them.
 */
export function renderReportHtml(model: ReportModel): string {
  const { meta } = model;
  const revisionLabel = meta.revision?.label ?? null;
  const flow = [
    coverSheet(meta),
    indexSection(indexEntries(model)),
    criteriaSection(model.criteria),
    revisionLogSection(model.revisionLog),
    `<div class="pp-b" id="narrative" data-break="before"></div>`,
    narrativeHtml(model.narrative, revisionLabel),
    checkRecordSection(model.checkRecord),
    model.responseLetter ? responseLetterSection(model.responseLetter) : "",
    appendicesSection(model.appendices),
  ].join("\n");
  const title = `${meta.jobNumber} ${meta.packageTitle} — ${meta.revision ? `Rev ${meta.revision.label}` : "PRELIMINARY"}`;
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8">
<title>${escapeHtml(title)}</title>
<meta name="panelpoint-fingerprint" content="${escapeHtml(meta.fingerprint)}">
<style>@page { size: ${meta.paperSize === "a4" ? "210mm 297mm" : "8.5in 11in"}; margin: 0; }</style>
<style>${embeddedFontCss()}</style>
<style>${reportCss()}</style>
</head>
<body data-paper="${meta.paperSize}" data-draft="${meta.revision ? "false" : "true"}" data-revision="${escapeHtml(revisionLabel ?? "")}">
${titleBlockTemplate(meta)}
<main id="pp-flow">
${flow}
</main>
</body></html>`;
}
