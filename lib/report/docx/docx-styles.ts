import { AlignmentType, type IStylesOptions } from "docx";
import { BODY_FONT, BODY_SIZE, CAUTION, CODE_FONT, HEADING_FONT, INK, INK_SOFT, SMALL_SIZE } from "./docx-fonts";

const heading = (size: number, before: number) => ({
  run: { font: HEADING_FONT, size, bold: true, color: INK },
  paragraph: { spacing: { before, after: 120 }, keepNext: true, keepLines: true },
});

/**
 * Our styles. The headings are Word's own Heading 1–4 (restyled, not renamed)
 * so the navigation pane and the table of contents field find them.
 */
export function docxStyles(): IStylesOptions {
  return {
    default: {
      document: { run: { font: BODY_FONT, size: BODY_SIZE, color: INK }, paragraph: { spacing: { after: 120, line: 276 } } },
      heading1: heading(30, 360),
      heading2: heading(25, 280),
      heading3: heading(22, 220),
      heading4: { ...heading(BODY_SIZE, 200), run: { font: HEADING_FONT, size: BODY_SIZE, bold: true, italics: true, color: INK } },
      caption: { run: { font: HEADING_FONT, size: SMALL_SIZE, color: INK_SOFT }, paragraph: { spacing: { before: 80, after: 80 }, keepNext: true } },
      hyperlink: { run: { color: "1F5FA8", underline: {} } },
      listParagraph: { paragraph: { spacing: { after: 60 } } },
    },
    paragraphStyles: [
      { id: "IndexTitle", name: "Index Title", basedOn: "Normal", ...heading(30, 360) },
      { id: "CoverTitle", name: "Cover Title", basedOn: "Normal", run: { font: HEADING_FONT, size: 44, bold: true }, paragraph: { spacing: { before: 240, after: 240 } } },
      { id: "CoverLabel", name: "Cover Label", basedOn: "Normal", run: { font: HEADING_FONT, size: SMALL_SIZE, color: INK_SOFT, allCaps: true }, paragraph: { spacing: { before: 120, after: 0 }, keepNext: true } },
      { id: "CoverValue", name: "Cover Value", basedOn: "Normal", run: { size: 26 }, paragraph: { spacing: { after: 80 } } },
      { id: "Preliminary", name: "Preliminary", basedOn: "Normal", run: { font: HEADING_FONT, size: 32, bold: true, color: CAUTION }, paragraph: { alignment: AlignmentType.CENTER, spacing: { before: 240, after: 240 } } },
      { id: "Caution", name: "Caution", basedOn: "Normal", run: { font: HEADING_FONT, size: SMALL_SIZE, color: CAUTION }, paragraph: { spacing: { before: 120, after: 120 } } },
      { id: "CalcTitle", name: "Calc Title", basedOn: "Normal", run: { font: HEADING_FONT, size: 23, bold: true }, paragraph: { spacing: { before: 240, after: 120 }, keepNext: true, border: { top: { style: "single", size: 6, color: INK, space: 4 } } } },
      { id: "CalcPart", name: "Calc Part", basedOn: "Normal", run: { font: HEADING_FONT, size: 18, bold: true, color: INK_SOFT, allCaps: true }, paragraph: { spacing: { before: 160, after: 60 }, keepNext: true } },
      { id: "Equation", name: "Equation", basedOn: "Normal", paragraph: { spacing: { before: 40, after: 80 }, indent: { left: 360 } } },
      { id: "StepNote", name: "Step Note", basedOn: "Normal", run: { size: 19, color: INK_SOFT }, paragraph: { spacing: { before: 80, after: 0 }, keepNext: true } },
      { id: "Quote", name: "Quote", basedOn: "Normal", run: { italics: true }, paragraph: { indent: { left: 567 }, border: { left: { style: "single", size: 12, color: INK_SOFT, space: 8 } } } },
      { id: "TableText", name: "Table Text", basedOn: "Normal", run: { size: 18 }, paragraph: { spacing: { before: 20, after: 20, line: 240 } } },
      { id: "TableHead", name: "Table Head", basedOn: "TableText", run: { font: HEADING_FONT, bold: true } },
      { id: "TableNumber", name: "Table Number", basedOn: "TableText", run: { font: CODE_FONT, size: 17 } },
      { id: "TitleBlock", name: "Title Block", basedOn: "Normal", run: { font: HEADING_FONT, size: 14 }, paragraph: { spacing: { before: 0, after: 0, line: 220 } } },
      { id: "FooterText", name: "Footer Text", basedOn: "Normal", run: { font: HEADING_FONT, size: 13, color: INK_SOFT }, paragraph: { spacing: { before: 0, after: 20, line: 200 } } },
      { id: "Note", name: "Note", basedOn: "Normal", run: { size: 18, italics: true, color: INK_SOFT } },
    ],
    characterStyles: [{ id: "CodeText", name: "Code Text", basedOn: "DefaultParagraphFont", run: { font: CODE_FONT, size: 18 } }],
  };
}
