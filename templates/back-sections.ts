import type { CheckRecordRow, ReportAppendix, ResponseLetter } from "../lib/report/report-model";
import { escapeHtml } from "./escape-html";
import { tableBlock } from "./report-table";
import { reportTableFrom } from "./report-table-from";
import { sectionTitle } from "./section-title";

const states = { checked: "Checked", returned: "Returned with remarks", unchecked: "Not checked" } as const;

/** Who checked which calc, and when. */
export function checkRecordSection(rows: CheckRecordRow[]): string {
  return [
    sectionTitle("check-record", "Check record"),
    tableBlock(reportTableFrom(["Calc", "Title", "State", "Checker", "Date"], rows.map((r) => [r.calcLabel, r.calcTitle, states[r.state], r.checker ?? "—", r.checkedAt ? r.checkedAt.slice(0, 10) : "—"]), "No calcs")),
  ].join("\n");
}

/** The plan-review response letter: each comment, the response and where it is answered. */
export function responseLetterSection(letter: ResponseLetter): string {
  const intro = `<div class="pp-b"><p>Response to the plan-review comments on revision ${escapeHtml(letter.answersRevisionLabel)}${letter.reviewer ? ` by ${escapeHtml(letter.reviewer)}` : ""}${letter.date ? `, dated ${escapeHtml(letter.date.slice(0, 10))}` : ""}. Each comment is answered below, with the calcs and sections of this revision where the answer is found.</p></div>`;
  const table = tableBlock(reportTableFrom(["No.", "Comment", "Response", "Answered in"], letter.comments.map((c) => [c.number, c.text, c.response, c.answeredIn.join(", ") || "—"]), "No comments"));
  return [sectionTitle("response-letter", "Response to plan-review comments"), intro, table].join("\n");
}

/** The appendices: full member-force tables. */
export function appendicesSection(appendices: ReportAppendix[]): string {
  return appendices
    .map((a, i) => {
      const id = `appendix-${i + 1}`;
      const title = `Appendix ${String.fromCharCode(65 + (i % 26))} — ${a.title}`;
      return [sectionTitle(id, title), ...a.tables.map((t) => tableBlock(t))].join("\n");
    })
    .join("\n");
}
