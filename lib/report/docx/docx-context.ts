import type { ReportMeta } from "../report-model";
import { newEquationTally, type EquationTally } from "./docx-math";
import { docxPage, type DocxPage } from "./docx-page";

/** What the section builders share while one document is assembled. */
export type DocxContext = {
  meta: ReportMeta;
  page: DocxPage;
  tally: EquationTally;
  /** Start values of the ordered lists met, each needing its own numbering definition. */
  orderedStarts: Set<number>;
  /** Every list gets its own numbering instance, so each ordered list restarts. */
  nextListInstance: () => number;
  /** Images that could not be decoded, printed as their alt text instead (and counted). */
  skippedImages: string[];
};

export function newDocxContext(meta: ReportMeta): DocxContext {
  let instance = 0;
  return {
    meta,
    page: docxPage(meta.paperSize),
    tally: newEquationTally(),
    orderedStarts: new Set(),
    nextListInstance: () => ++instance,
    skippedImages: [],
  };
}

export const orderedListReference = (start: number) => `pp-ordered-${start}`;
export const BULLET_REFERENCE = "pp-bullet";
