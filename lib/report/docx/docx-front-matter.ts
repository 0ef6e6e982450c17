import { Paragraph, TableOfContents, TextRun } from "docx";
import type { ReportModel } from "../report-model";
import { headingParagraph, type BodyElement } from "./docx-blocks";
import type { DocxContext } from "./docx-context";
import { docxStringTable } from "./docx-table";
import { isoDay } from "./report-dates";

const note = (text: string) => new Paragraph({ style: "Note", children: [new TextRun(text)] });
const sub = (text: string) => headingParagraph(2, text);

/**
 * The index is Word's own table-of-contents field over the heading styles:
 * only a layout program knows sheet numbers, so Word fills them in when it
 * opens the file (it asks first) or on F9.
 */
export function docxIndex(): BodyElement[] {
  return [
    // Styled like Heading 1 but not one, so the index does not list itself.
    new Paragraph({ style: "IndexTitle", pageBreakBefore: true, children: [new TextRun("Index")] }),
    note("Sheet numbers are filled in by the word processor: accept the prompt to update fields when the file opens, or select the index and update it (F9)."),
    new TableOfContents("Index", { hyperlink: true, headingStyleRange: "1-3" }),
  ];
}

/** Codes and editions, materials, load cases and combinations, as drawn from the calcs. */
export function docxDesignCriteria(model: ReportModel, context: DocxContext): BodyElement[] {
  const { criteria } = model;
  const width = context.page.contentWidthTwips;
  const usedBy = (ids: string[]) => ids.join(", ");
  const part = (title: string, rows: string[][], header: string[], widths: number[]) => [
    sub(title),
    ...(rows.length ? docxStringTable({ caption: null, header, rows }, width, widths) : [note("None stated in this package.")]),
  ];
  return [
    headingParagraph(1, "Design criteria", "design-criteria", { pageBreakBefore: true }),
    ...part("Codes and standards", criteria.codes.map((c) => [c.code, c.edition, c.clauses.join(", ")]), ["Code", "Edition", "Clauses"], [0.4, 0.2, 0.4]),
    ...part("Materials", criteria.materials.map((m) => [m.name, m.properties, usedBy(m.usedBy)]), ["Material", "Properties", "Used by"], [0.25, 0.5, 0.25]),
    ...part("Load cases", criteria.loadCases.map((l) => [l.id, l.kind, l.description, usedBy(l.usedBy)]), ["Case", "Kind", "Description", "Used by"], [0.12, 0.18, 0.5, 0.2]),
    ...part("Load combinations", criteria.combinations.map((c) => [c.name, c.expression, usedBy(c.usedBy)]), ["Combination", "Expression", "Used by"], [0.25, 0.5, 0.25]),
  ];
}

export function docxRevisionLog(model: ReportModel, context: DocxContext): BodyElement[] {
  return [
    headingParagraph(1, "Revision log", "revision-log"),
    ...(model.revisionLog.length
      ? docxStringTable({ caption: null, header: ["Rev", "Date", "By", "Description"], rows: model.revisionLog.map((r) => [r.label, isoDay(r.date), r.by, r.description]) }, context.page.contentWidthTwips, [0.1, 0.16, 0.22, 0.52])
      : [note("No revisions issued yet.")]),
  ];
}
