import type { DesignCriteria, RevisionLogRow } from "../lib/report/report-model";
import { reportTableFrom } from "./report-table-from";
import { sectionTitle, subTitle } from "./section-title";
import { tableBlock } from "./report-table";

/** The design criteria summary: codes, materials, load cases and combinations, each with the calcs using it. */
export function criteriaSection(c: DesignCriteria): string {
  const parts = [sectionTitle("criteria", "Design criteria summary")];
  parts.push(subTitle("Codes and standards"), tableBlock(reportTableFrom(["Code", "Edition", "Clauses referred to"], c.codes.map((x) => [x.code, x.edition, x.clauses.join(", ") || "—"]), "None referenced")));
  parts.push(subTitle("Materials"), tableBlock(reportTableFrom(["Material", "Properties", "Used by"], c.materials.map((m) => [m.name, m.properties, m.usedBy.join(", ")]), "None named by the calcs")));
  parts.push(subTitle("Load cases"), tableBlock(reportTableFrom(["Case", "Kind", "Loads", "Used by"], c.loadCases.map((l) => [l.id, l.kind, l.description, l.usedBy.join(", ")]), "No load cases")));
  parts.push(subTitle("Load combinations"), tableBlock(reportTableFrom(["Combination", "Factors", "Used by"], c.combinations.map((x) => [x.name, x.expression, x.usedBy.join(", ")]), "No combinations")));
  return parts.join("\n");
}

/** The revision log, oldest first; the revision exported is the last row. */
export function revisionLogSection(rows: RevisionLogRow[]): string {
  return [sectionTitle("revisions", "Revision log"), tableBlock(reportTableFrom(["Revision", "Date", "By", "Description"], rows.map((r) => [r.label, r.date.slice(0, 10), r.by, r.description]), "No revisions"))].join("\n");
}
