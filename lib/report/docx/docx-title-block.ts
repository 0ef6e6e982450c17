import { BorderStyle, Footer, Header, PageNumber, Paragraph, Table, TableCell, TableRow, TextRun, WidthType } from "docx";
import type { DocxContext } from "./docx-context";
import { CAUTION, INK, INK_SOFT, RULE } from "./docx-fonts";
import { PRELIMINARY, revisionText } from "./draft-marking";
import { isoDay } from "./report-dates";

const line = { style: BorderStyle.SINGLE, size: 4, color: RULE };
const frame = { style: BorderStyle.SINGLE, size: 8, color: INK };

function field(label: string, value: (string | TextRun)[] | string, width: number): TableCell {
  const values = typeof value === "string" ? [new TextRun(value)] : value.map((v) => (typeof v === "string" ? new TextRun(v) : v));
  return new TableCell({
    width: { size: width, type: WidthType.DXA },
    margins: { top: 20, bottom: 20, left: 60, right: 60 },
    children: [
      new Paragraph({ style: "TitleBlock", children: [new TextRun({ text: label.toUpperCase(), color: INK_SOFT, size: 11 })] }),
      new Paragraph({ style: "TitleBlock", children: values }),
    ],
  });
}

/**
 * The title block on every sheet: firm, project, job, subject, by/date,
 * checked/date, revision and "Sheet x of y" as PAGE and NUMPAGES fields, which
 * Word and LibreOffice fill in as they lay out pages.
 */
export function docxHeader(context: DocxContext): Header {
  const { meta } = context;
  const width = context.page.contentWidthTwips;
  const col = [0.28, 0.3, 0.22, 0.2].map((f) => Math.floor(f * width));
  const sheet = new TextRun({ children: ["Sheet ", PageNumber.CURRENT, " of ", PageNumber.TOTAL_PAGES], bold: true });
  const rows = [
    [field("Firm", meta.firmName, col[0]), field("Project", meta.projectName, col[1]), field("Job no.", meta.jobNumber, col[2]), field("Revision", revisionText(meta), col[3])],
    [
      field("Subject", meta.packageTitle, col[0]),
      field("By / date", `${meta.preparedBy.name} ${isoDay(meta.preparedBy.date)}`, col[1]),
      field("Checked / date", meta.checkedBy ? `${meta.checkedBy.name} ${isoDay(meta.checkedBy.date)}` : "\u2014", col[2]),
      field("Sheet", [sheet], col[3]),
    ],
  ];
  return new Header({
    children: [
      new Table({
        width: { size: width, type: WidthType.DXA },
        columnWidths: col,
        borders: { top: frame, bottom: frame, left: frame, right: frame, insideHorizontal: line, insideVertical: line },
        rows: rows.map((children) => new TableRow({ cantSplit: true, children })),
      }),
    ],
  });
}

/** The fingerprint that identifies the content, and the caution, at the foot of every sheet. */
export function docxFooter(context: DocxContext): Footer {
  const { meta } = context;
  return new Footer({
    children: [
      new Paragraph({
        style: "FooterText",
        border: { top: { style: BorderStyle.SINGLE, size: 4, color: RULE, space: 4 } },
        children: [new TextRun("Package fingerprint (SHA-256) "), new TextRun({ text: meta.fingerprint, font: "JetBrains Mono", color: INK })],
      }),
      ...(meta.revision ? [] : [new Paragraph({ style: "FooterText", children: [new TextRun({ text: PRELIMINARY, bold: true, color: CAUTION })] })]),
      new Paragraph({ style: "FooterText", children: [new TextRun({ text: meta.safetyText, color: CAUTION })] }),
    ],
  });
}
