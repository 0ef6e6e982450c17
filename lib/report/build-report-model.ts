import { evaluateCalcs } from "../calcs/evaluate-calcs";
import { extractCalcs } from "../calcs/extract-calcs";
import type { CalcResult, TrussValue } from "../calcs/calc-types";
import type { PackageDocument } from "../document/document-types";
import { designCriteria } from "./model/design-criteria";
import { narrativeBlocks, standardReferences } from "./model/narrative-blocks";
import { reportAppendices } from "./model/report-appendices";
import { reportCalc } from "./model/report-calc";
import type { CheckRecordRow, ReportCalc, ReportMeta, ReportModel, ResponseLetter, RevisionLogRow } from "./report-model";

/** What the report is built from; the caller loads it (document, revision, seal, checks…). */
export type ReportSource = {
  document: PackageDocument;
  meta: ReportMeta;
  /** An issued revision's frozen results; absent for a draft, whose calcs are recomputed here. */
  results?: Record<string, CalcResult>;
  checkRecord: CheckRecordRow[];
  revisionLog: RevisionLogRow[];
  responseLetter: ResponseLetter | null;
  changedCalcIds: string[];
  /** Figure images the caller fetched from storage, as data: URIs by the figure node's src. */
  figureImages?: Record<string, string>;
};

/**
 * The report model of a package. Pure: no database, no I/O. A draft's calcs
 * are recomputed from the document on the server (results from a browser are
 * never trusted); an issued revision passes the results frozen with it.
 */
export function buildReportModel(source: ReportSource): ReportModel {
  const calcs = extractCalcs(source.document);
  const results = source.results ?? evaluateCalcs({ calcs }).results;
  const byLabel = new Map(Object.values(results).map((r) => [r.label, r]));
  const trussOf = (label: string): TrussValue | null => {
    const value = byLabel.get(label)?.exports.model;
    return value?.type === "truss" ? value : null;
  };
  const changed = new Set(source.changedCalcIds);
  const reportCalcs = new Map<string, ReportCalc>();
  for (const calc of calcs) {
    if (!reportCalcs.has(calc.id)) reportCalcs.set(calc.id, reportCalc(calc, results[calc.id], { revised: changed.has(calc.id), trussOf }));
  }
  return {
    meta: source.meta,
    criteria: designCriteria(standardReferences(source.document), calcs, results),
    revisionLog: source.revisionLog,
    narrative: narrativeBlocks(source.document, { calc: (id) => reportCalcs.get(id) ?? null, figureImages: source.figureImages }),
    checkRecord: source.checkRecord,
    responseLetter: source.responseLetter,
    appendices: reportAppendices(calcs, results),
    changedCalcIds: source.changedCalcIds,
  };
}
