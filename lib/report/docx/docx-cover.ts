import { BorderStyle, ExternalHyperlink, Paragraph, Table, TableCell, TableRow, TextRun, WidthType, type ParagraphChild } from "docx";
import type { ReportMeta } from "../report-model";
import type { BodyElement } from "./docx-blocks";
import type { DocxContext } from "./docx-context";
import { INK, RULE } from "./docx-fonts";
import { imageFromDataUri } from "./docx-images";
import { docxGrid } from "./docx-table";
import { PRELIMINARY, revisionText } from "./draft-marking";
import { isoDay } from "./report-dates";

const label = (text: string) => new Paragraph({ style: "CoverLabel", children: [new TextRun(text)] });
const value = (text: string) => new Paragraph({ style: "CoverValue", children: [new TextRun(text)] });

/** The cover sheet: what the package is, for whom, which revision, and who seals it. */
export function docxCover(context: DocxContext): BodyElement[] {
  const { meta } = context;
  const issued = meta.revision;
  const facts: [string, string][] = [
    ["Project", meta.projectName],
    ["Job number", meta.jobNumber],
    ["Client", meta.client ?? "\u2014"],
    ["Site", meta.site ?? "\u2014"],
    ["Revision", issued ? `Rev ${issued.label}` : "Draft (not issued)"],
    ["Date", isoDay(issued?.issuedAt ?? meta.generatedAt)],
    ["Prepared by", `${meta.preparedBy.name}, ${isoDay(meta.preparedBy.date)}`],
    ["Checked by", meta.checkedBy ? `${meta.checkedBy.name}, ${isoDay(meta.checkedBy.date)}` : "Not checked"],
  ];
  if (issued) facts.push(["Issued by", issued.issuedBy]);

  const out: BodyElement[] = [
    label(meta.firmName),
    new Paragraph({ style: "CoverTitle", children: [new TextRun(meta.packageTitle)] }),
    value("Structural calculation package"),
  ];
  if (!issued) out.push(new Paragraph({ style: "Preliminary", children: [new TextRun(PRELIMINARY)] }));
  out.push(
    docxGrid({
      header: null,
      rows: facts.map(([k, v]) => [[new TextRun({ text: k, bold: true })], [new TextRun(v)]]),
      widths: [0.3, 0.7],
      widthTwips: context.page.contentWidthTwips,
    }),
    new Paragraph({ children: [] }),
    ...sealBlock(meta, context),
  );
  if (meta.verification) {
    out.push(
      label("Verification"),
      new Paragraph({
        children: [
          new TextRun("Check that this file is the one issued at "),
          new ExternalHyperlink({ link: meta.verification.url, children: [new TextRun({ text: meta.verification.url, style: "Hyperlink" })] }),
          new TextRun({ text: ` (token ${meta.verification.token})`, style: "CodeText" }),
        ],
      }),
    );
  }
  out.push(
    label("Package fingerprint (SHA-256)"),
    new Paragraph({ children: [new TextRun({ text: meta.fingerprint, style: "CodeText" })] }),
    new Paragraph({ style: "Caution", children: [new TextRun({ text: meta.safetyText, bold: true })] }),
  );
  return out;
}

/** The engineer of record's seal beside their particulars, and room to sign. */
function sealBlock(meta: ReportMeta, context: DocxContext): BodyElement[] {
  const seal = meta.seal;
  const sealPicture: ParagraphChild[] = [];
  if (seal?.imageDataUri) {
    const image = imageFromDataUri(seal.imageDataUri, { maxWidth: 160, maxHeight: 160 }, `Seal of ${seal.name}`);
    if (image) sealPicture.push(image);
    else context.skippedImages.push(`Seal of ${seal.name}`);
  }
  const particulars = seal
    ? [
        label("Engineer of record"),
        value(seal.name),
        new Paragraph({ children: [new TextRun(`Licence ${seal.licenceNumber}, ${seal.jurisdiction}`)] }),
        new Paragraph({ children: [new TextRun(`Licence expires ${isoDay(seal.expiresOn)}`)] }),
      ]
    : [label("Engineer of record"), new Paragraph({ children: [new TextRun(meta.revision ? "No seal on file for this revision." : `Not sealed: ${revisionText(meta).toLowerCase()} package.`)] })];
  const signature = [
    new Paragraph({ spacing: { before: 480 }, border: { bottom: { style: BorderStyle.SINGLE, size: 6, color: INK, space: 1 } }, children: [] }),
    new Paragraph({ style: "CoverLabel", children: [new TextRun("Signature and date")] }),
  ];
  const width = context.page.contentWidthTwips;
  const box = { style: BorderStyle.SINGLE, size: 6, color: RULE };
  const none = { style: BorderStyle.NONE, size: 0, color: "auto" };
  return [
    label("Seal"),
    new Table({
      width: { size: width, type: WidthType.DXA },
      columnWidths: [Math.floor(width * 0.35), Math.floor(width * 0.65)],
      borders: { top: box, bottom: box, left: box, right: box, insideHorizontal: none, insideVertical: box },
      rows: [
        new TableRow({
          cantSplit: true,
          children: [
            new TableCell({ width: { size: Math.floor(width * 0.35), type: WidthType.DXA }, children: [new Paragraph({ children: sealPicture.length ? sealPicture : [new TextRun({ text: "(seal)", color: RULE })] })] }),
            new TableCell({ width: { size: Math.floor(width * 0.65), type: WidthType.DXA }, margins: { left: 160, right: 160 }, children: [...particulars, ...signature] }),
          ],
        }),
      ],
    }),
  ];
}
