import type { InlineNode } from "../../document/document-types";
import type { ReportRun } from "../report-model";
import { formatStandardReference } from "./format-standard-reference";

/** A paragraph's or heading's inline content as report runs; standard references become their printed text. */
export function inlineRuns(content: readonly InlineNode[] | undefined): ReportRun[] {
  const runs: ReportRun[] = [];
  for (const node of content ?? []) {
    if (node.type === "hardBreak") runs.push({ type: "break" });
    else if (node.type === "standardReference") runs.push({ type: "text", text: formatStandardReference(node.attrs) });
    else if (node.type === "text") {
      const run: Extract<ReportRun, { type: "text" }> = { type: "text", text: node.text };
      for (const mark of node.marks ?? []) {
        if (mark.type === "bold") run.bold = true;
        else if (mark.type === "italic") run.italic = true;
        else if (mark.type === "code") run.code = true;
        else if (mark.type === "subscript") run.sub = true;
        else if (mark.type === "superscript") run.sup = true;
        else if (mark.type === "link") run.href = mark.attrs.href;
      }
      runs.push(run);
    }
  }
  return runs;
}

/** The plain text of inline content (headings, captions). */
export function inlineText(content: readonly InlineNode[] | undefined): string {
  return inlineRuns(content).map((r) => (r.type === "text" ? r.text : r.type === "break" ? " " : r.tex)).join("");
}
