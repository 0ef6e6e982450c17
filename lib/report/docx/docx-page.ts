import type { PaperSize } from "../report-model";

/** Twips (1/1440 in). Letter is 8.5 × 11 in; A4 is 210 × 297 mm. */
const PAPER = {
  letter: { width: 12240, height: 15840 },
  a4: { width: 11906, height: 16838 },
} as const;

/** Room at the top for the title block, at the bottom for the fingerprint and the caution. */
const MARGIN = { top: 1900, bottom: 1300, left: 1080, right: 1080, header: 400, footer: 400 };

export type DocxPage = { width: number; height: number; margin: typeof MARGIN; contentWidthTwips: number; contentWidthPx: number };

export function docxPage(paperSize: PaperSize): DocxPage {
  const paper = PAPER[paperSize];
  const contentWidthTwips = paper.width - MARGIN.left - MARGIN.right;
  // docx sizes images in pixels at 96 per inch: 15 twips each.
  return { ...paper, margin: MARGIN, contentWidthTwips, contentWidthPx: Math.floor(contentWidthTwips / 15) };
}
