import { AlignmentType, Document, LevelFormat, Packer, PageBreak, Paragraph, TextRun, type ILevelsOptions } from "docx";
import type { ReportModel } from "../report-model";
import { docxAppendices, docxCheckRecord, docxResponseLetter } from "./docx-back-matter";
import { docxBlocks } from "./docx-blocks";
import { BULLET_REFERENCE, newDocxContext, orderedListReference, type DocxContext } from "./docx-context";
import { docxCover } from "./docx-cover";
import { docxDesignCriteria, docxIndex, docxRevisionLog } from "./docx-front-matter";
import type { EquationTally } from "./docx-math";
import { docxStyles } from "./docx-styles";
import { docxFooter, docxHeader } from "./docx-title-block";

export type DocxRendering = {
  buffer: Buffer;
  /** Equations written as native OMML, and those printed as TeX because they could not be converted. */
  equations: EquationTally;
  /** Images (figures, diagrams, the seal) that could not be read and were replaced by a note. */
  skippedImages: string[];
};

/** The package as a Word document whose equations stay native, editable equations. */
export async function renderReportDocx(model: ReportModel): Promise<Buffer> {
  return (await renderReportDocxWithStats(model)).buffer;
}

/** The same, with the tally of what could not be converted, for the export log. */
export async function renderReportDocxWithStats(model: ReportModel): Promise<DocxRendering> {
  const context = newDocxContext(model.meta);
  const body = [
    ...docxCover(context),
    ...docxIndex(),
    ...docxDesignCriteria(model, context),
    ...docxRevisionLog(model, context),
    new Paragraph({ children: [new PageBreak()] }),
    ...docxBlocks(model.narrative, context),
    ...docxCheckRecord(model, context),
    ...docxResponseLetter(model, context),
    ...docxAppendices(model, context),
    ...failureNote(context),
  ];
  const { meta } = model;
  const document = new Document({
    creator: meta.preparedBy.name,
    title: meta.packageTitle,
    subject: `${meta.projectName} (${meta.jobNumber})`,
    description: meta.safetyText,
    features: { updateFields: true },
    styles: docxStyles(),
    numbering: { config: numberingConfig(context) },
    sections: [
      {
        properties: { page: { size: { width: context.page.width, height: context.page.height }, margin: context.page.margin } },
        headers: { default: docxHeader(context) },
        footers: { default: docxFooter(context) },
        children: body,
      },
    ],
  });
  const buffer = await Packer.toBuffer(document);
  return { buffer, equations: context.tally, skippedImages: context.skippedImages };
}

/** Anything printed as TeX is said so at the end, never left for the reader to notice. */
function failureNote(context: DocxContext): Paragraph[] {
  const failed = context.tally.failed.length;
  if (failed === 0) return [];
  return [
    new Paragraph({
      style: "Caution",
      children: [new TextRun(`${failed} equation${failed === 1 ? " is" : "s are"} printed as TeX in the code font because they could not be converted to Word equations.`)],
    }),
  ];
}

function numberingConfig(context: DocxContext) {
  const levels = (format: "bullet" | "decimal", start = 1): ILevelsOptions[] =>
    Array.from({ length: 9 }, (_, level) => ({
      level,
      format: format === "bullet" ? LevelFormat.BULLET : [LevelFormat.DECIMAL, LevelFormat.LOWER_LETTER, LevelFormat.LOWER_ROMAN][level % 3],
      text: format === "bullet" ? ["\u2022", "\u2013", "\u25E6"][level % 3] : `%${level + 1}.`,
      start: level === 0 ? start : 1,
      alignment: AlignmentType.LEFT,
      style: { paragraph: { indent: { left: 720 * (level + 1), hanging: 360 } } },
    }));
  return [
    { reference: BULLET_REFERENCE, levels: levels("bullet") },
    ...[...context.orderedStarts].map((start) => ({ reference: orderedListReference(start), levels: levels("decimal", start) })),
  ];
}
