import { Bookmark, BorderStyle, HeadingLevel, Paragraph, PageBreak, Table, TableOfContents, TextRun } from "docx";
import type { ReportBlock } from "../report-model";
import { bookmarkName } from "./bookmark-name";
import { docxCalc } from "./docx-calc";
import { BULLET_REFERENCE, orderedListReference, type DocxContext } from "./docx-context";
import { RULE } from "./docx-fonts";
import { imageFromDataUri } from "./docx-images";
import { docxRuns } from "./docx-runs";
import { docxGrid, spacer } from "./docx-table";

export type BodyElement = Paragraph | Table | TableOfContents;

const HEADING = { 1: HeadingLevel.HEADING_1, 2: HeadingLevel.HEADING_2, 3: HeadingLevel.HEADING_3, 4: HeadingLevel.HEADING_4 } as const;

type Place = { style?: string; indentLevel: number };

/** The narrative's blocks in order, calcs included. */
export function docxBlocks(blocks: ReportBlock[], context: DocxContext, place: Place = { indentLevel: 0 }): BodyElement[] {
  return blocks.flatMap((block) => docxBlock(block, context, place));
}

function docxBlock(block: ReportBlock, context: DocxContext, place: Place): BodyElement[] {
  const indent = place.indentLevel > 0 ? { left: 720 * place.indentLevel } : undefined;
  switch (block.type) {
    case "heading":
      return [headingParagraph(block.level, `${block.number ? `${block.number}  ` : ""}${block.text}`, block.anchor)];
    case "paragraph":
      return [new Paragraph({ style: place.style, indent, children: docxRuns(block.runs, context) })];
    case "list":
      return docxList(block, context, place.indentLevel);
    case "quote":
      return docxBlocks(block.blocks, context, { ...place, style: "Quote" });
    case "rule":
      return [new Paragraph({ border: { bottom: { style: BorderStyle.SINGLE, size: 6, color: RULE, space: 1 } }, children: [] })];
    case "pageBreak":
      return [new Paragraph({ children: [new PageBreak()] })];
    case "figure":
      return docxFigure(block, context);
    case "table": {
      const width = context.page.contentWidthTwips - 720 * place.indentLevel;
      const cells = (row: typeof block.rows[number]) => row.map((cell) => docxRuns(cell, context));
      return [docxGrid({ header: block.header ? cells(block.header) : null, rows: block.rows.map(cells), widthTwips: width }), spacer()];
    }
    case "calc":
      return docxCalc(block.calc, context);
  }
}

/** A Word heading (its built-in style, for the navigation pane and the contents), bookmarked under its anchor. */
export function headingParagraph(level: 1 | 2 | 3 | 4, text: string, anchor?: string, options: { pageBreakBefore?: boolean } = {}): Paragraph {
  const run = new TextRun(text);
  return new Paragraph({
    heading: HEADING[level],
    pageBreakBefore: options.pageBreakBefore,
    children: anchor ? [new Bookmark({ id: bookmarkName(anchor), children: [run] })] : [run],
  });
}

function docxList(block: Extract<ReportBlock, { type: "list" }>, context: DocxContext, indentLevel: number): BodyElement[] {
  const level = Math.min(indentLevel, 8);
  let reference = BULLET_REFERENCE;
  if (block.ordered) {
    context.orderedStarts.add(block.start);
    reference = orderedListReference(block.start);
  }
  const instance = context.nextListInstance();
  return block.items.flatMap((item) => {
    const [first, ...rest] = item;
    const numbering = { reference, level, instance };
    // The number belongs on the item's first paragraph; an item that opens with something else gets an empty numbered line.
    const lead =
      first?.type === "paragraph"
        ? [new Paragraph({ numbering, children: docxRuns(first.runs, context) })]
        : [new Paragraph({ numbering, children: [] }), ...(first ? docxBlocks([first], context, { indentLevel: indentLevel + 1 }) : [])];
    return [...lead, ...docxBlocks(rest, context, { indentLevel: indentLevel + 1 })];
  });
}

function docxFigure(block: Extract<ReportBlock, { type: "figure" }>, context: DocxContext): BodyElement[] {
  const caption = block.caption ? [new Paragraph({ style: "Caption", children: [new TextRun(block.caption)] })] : [];
  const label = block.alt ?? block.caption ?? "Figure";
  const box = { maxWidth: context.page.contentWidthPx, maxHeight: 720, width: block.image?.width, height: block.image?.height };
  const image = block.image ? imageFromDataUri(block.image.dataUri, box, label) : null;
  if (block.image && !image) context.skippedImages.push(label);
  const picture = image
    ? new Paragraph({ keepNext: caption.length > 0, children: [image] })
    : new Paragraph({ style: "Note", children: [new TextRun(`[Image not available: ${label}]`)] });
  return [picture, ...caption];
}
