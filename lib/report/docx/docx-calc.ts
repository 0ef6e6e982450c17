import { Paragraph, TextRun } from "docx";
import type { ReportCalc } from "../report-model";
import type { BodyElement } from "./docx-blocks";
import type { DocxContext } from "./docx-context";
import { CAUTION } from "./docx-fonts";
import { svgImage } from "./docx-images";
import { equationRun } from "./docx-math";
import { docxGrid, docxStringTable, spacer } from "./docx-table";

const part = (text: string) => new Paragraph({ style: "CalcPart", children: [new TextRun(text)] });

/**
 * One calc as its sheet reads: title (with the revision mark when it changed),
 * inputs, diagram, the working as native equations, and the results, or the
 * messages in their place when the calc did not solve.
 */
export function docxCalc(calc: ReportCalc, context: DocxContext): BodyElement[] {
  const width = context.page.contentWidthTwips;
  const title = calc.title && calc.title !== calc.kindName ? `${calc.kindName}: ${calc.title}` : calc.kindName;
  const out: BodyElement[] = [
    new Paragraph({
      style: "CalcTitle",
      children: [
        new TextRun(`${calc.label}  ${title}`),
        ...(calc.revised ? [new TextRun({ text: `   \u25B3 Revised${context.meta.previousRevisionLabel ? ` since Rev ${context.meta.previousRevisionLabel}` : ""}`, color: CAUTION, size: 18 })] : []),
      ],
    }),
  ];

  if (calc.inputs.length > 0) {
    out.push(part("Inputs"));
    for (const table of calc.inputs) out.push(...docxStringTable(table, width));
  }

  if (calc.diagramSvg) {
    const image = svgImage(calc.diagramSvg, { maxWidth: context.page.contentWidthPx, maxHeight: 480 }, `${calc.label} diagram`);
    if (image) out.push(new Paragraph({ children: [image] }));
    else context.skippedImages.push(`${calc.label} diagram`);
  }

  if (calc.steps.length > 0) {
    out.push(part("Working"));
    for (const step of calc.steps) {
      if (step.text) out.push(new Paragraph({ style: "StepNote", children: [new TextRun(step.text)] }));
      out.push(new Paragraph({ style: "Equation", children: [equationRun(step.latex, context.tally, { display: true })] }));
    }
  }

  if (calc.status === "ok" && calc.results.length > 0) {
    out.push(part("Results"));
    out.push(
      docxGrid({
        header: [[new TextRun("Quantity")], [new TextRun("Reference")], [new TextRun("Value")], [new TextRun("Unit")]],
        rows: calc.results.map((r) => [[equationRun(r.tex, context.tally)], [new TextRun({ text: `${calc.label}.${r.name}`, style: "CodeText" })], [new TextRun(r.value)], [new TextRun(r.unit)]]),
        align: ["left", "left", "right", "left"],
        widths: [0.3, 0.35, 0.2, 0.15],
        widthTwips: width,
      }),
      spacer(),
    );
  }

  if (calc.messages.length > 0) {
    out.push(part(calc.status === "ok" ? "Notes" : calc.status === "blocked" ? "Not evaluated" : "Not solved"));
    for (const message of calc.messages) out.push(new Paragraph({ style: calc.status === "ok" ? "Note" : "Caution", children: [new TextRun(message)] }));
  }
  return out;
}
