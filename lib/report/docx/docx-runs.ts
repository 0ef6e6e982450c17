import { ExternalHyperlink, InternalHyperlink, TextRun, type ParagraphChild } from "docx";
import type { ReportRun } from "../report-model";
import type { DocxContext } from "./docx-context";
import { equationRun } from "./docx-math";
import { bookmarkName } from "./bookmark-name";

type TextOptions = { bold?: boolean; italics?: boolean; style?: string };

/** Inline content: text with its marks, links, line breaks and inline equations. */
export function docxRuns(runs: ReportRun[], context: DocxContext, base: TextOptions = {}): ParagraphChild[] {
  return runs.map((run) => {
    if (run.type === "break") return new TextRun({ break: 1 });
    if (run.type === "math") return equationRun(run.tex, context.tally);
    const text = new TextRun({
      text: run.text,
      bold: run.bold ?? base.bold,
      italics: run.italic ?? base.italics,
      subScript: run.sub,
      superScript: run.sup,
      style: run.code ? "CodeText" : run.href ? "Hyperlink" : base.style,
    });
    if (!run.href) return text;
    if (run.href.startsWith("#")) return new InternalHyperlink({ anchor: bookmarkName(run.href.slice(1)), children: [text] });
    return new ExternalHyperlink({ link: run.href, children: [text] });
  });
}

/** Plain text as paragraph content. */
export const plain = (text: string, options: TextOptions = {}): ParagraphChild => new TextRun({ text, ...options });
