import { Paragraph, TextRun } from "docx";
import type { ReportModel } from "../report-model";
import { headingParagraph, type BodyElement } from "./docx-blocks";
import type { DocxContext } from "./docx-context";
import { docxStringTable } from "./docx-table";
import { isoDay } from "./report-dates";

const STATE = { checked: "Checked", returned: "Returned", unchecked: "Not checked" } as const;
const note = (text: string) => new Paragraph({ style: "Note", children: [new TextRun(text)] });

/** Who checked which calc, and when. */
export function docxCheckRecord(model: ReportModel, context: DocxContext): BodyElement[] {
  const rows = model.checkRecord.map((r) => [r.calcLabel, r.calcTitle, STATE[r.state], r.checker ?? "\u2014", isoDay(r.checkedAt) || "\u2014"]);
  return [
    headingParagraph(1, "Check record", "check-record", { pageBreakBefore: true }),
    ...(rows.length
      ? docxStringTable({ caption: null, header: ["Calc", "Title", "State", "Checker", "Date"], rows }, context.page.contentWidthTwips, [0.1, 0.38, 0.16, 0.2, 0.16])
      : [note("The package has no calcs to check.")]),
  ];
}

/** The answers to the plan reviewer's comments, each pointing to where this revision answers it. */
export function docxResponseLetter(model: ReportModel, context: DocxContext): BodyElement[] {
  const letter = model.responseLetter;
  if (!letter) return [];
  const by = [letter.reviewer ? `from ${letter.reviewer}` : null, letter.date ? `dated ${isoDay(letter.date)}` : null].filter(Boolean).join(", ");
  const rows = letter.comments.map((c) => [c.number, c.text, c.response, c.answeredIn.join("; ") || "\u2014"]);
  return [
    headingParagraph(1, "Response to plan-review comments", "response-letter", { pageBreakBefore: true }),
    new Paragraph({
      children: [new TextRun(`This revision answers the plan-review comments on Rev ${letter.answersRevisionLabel}${by ? ` ${by}` : ""}. Each response names where in this package the comment is addressed.`)],
    }),
    ...(rows.length
      ? docxStringTable({ caption: null, header: ["No.", "Comment", "Response", "Answered in"], rows }, context.page.contentWidthTwips, [0.08, 0.36, 0.36, 0.2])
      : [note("No comments were recorded.")]),
  ];
}

const appendixLetter = (index: number) => (index < 26 ? String.fromCharCode(65 + index) : `A${index - 25}`);

/** Full member-force tables, one appendix per truss-bearing calc. */
export function docxAppendices(model: ReportModel, context: DocxContext): BodyElement[] {
  return model.appendices.flatMap((appendix, index) => [
    headingParagraph(1, `Appendix ${appendixLetter(index)}  ${appendix.title}`, `appendix-${appendixLetter(index)}`, { pageBreakBefore: true }),
    new Paragraph({ style: "Note", children: [new TextRun(`Full tables for calc ${appendix.calcLabel}.`)] }),
    ...appendix.tables.flatMap((table) => docxStringTable(table, context.page.contentWidthTwips)),
  ]);
}
