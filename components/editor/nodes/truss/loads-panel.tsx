"use client";

import { useMemo } from "react";
import { errorsForTable } from "@/components/editor/input-table/errors-for-table";
import { InputTable } from "@/components/editor/input-table/input-table";
import type { CalcFieldError } from "@/lib/calcs/calc-types";
import { loadCaseKinds } from "@/lib/calcs/truss/truss-inputs";
import { lineLoadRows, lineLoadsFromRows } from "./line-load-rows";
import { mergeCaseRows, type CaseRow } from "./merge-case-rows";
import type { trussColumns } from "./truss-columns";
import type { LoadCaseDraft, LoadRow, TrussDraft } from "./truss-draft";

export type LoadsPanelProps = {
  draft: TrussDraft;
  columns: ReturnType<typeof trussColumns>;
  fieldErrors: readonly CalcFieldError[];
  readOnly: boolean;
  onChange: (patch: Pick<TrussDraft, "loadCases"> | Pick<TrussDraft, "lineLoads">) => void;
};

/**
 * Load cases, each case's joint loads, and line loads on a chord. Joint
 * loads are global components (fy negative is downward); a line load's w is
 * downward when positive and is lumped at the chord's panel points.
 */
export function LoadsPanel({ draft, columns, fieldErrors, readOnly, onChange }: LoadsPanelProps) {
  const caseRows = useMemo<CaseRow[]>(() => draft.loadCases.map((c) => ({ id: c.id, kind: c.kind })), [draft.loadCases]);
  const setLoads = (index: number, loads: LoadRow[]) =>
    onChange({ loadCases: draft.loadCases.map((c, i): LoadCaseDraft => (i === index ? { ...c, loads } : c)) });
  return (
    <div className="space-y-4">
      <section aria-label="Load cases">
        <h4 className="pp-label">Load cases</h4>
        <InputTable
          columns={columns.cases}
          rows={caseRows}
          onChange={(rows) => onChange({ loadCases: mergeCaseRows(draft.loadCases, caseRows, rows) })}
          errors={errorsForTable(fieldErrors, "loadCases")}
          readOnly={readOnly}
          caption="Load cases"
          addLabel="Add load case"
          rowName={(r, i) => `case ${r.id || i + 1}`}
        />
        <p className="mt-1 text-xs text-ink-faint">Kinds the combination sets know: {loadCaseKinds.join(", ")}; any other word is a custom kind.</p>
      </section>
      {draft.loadCases.map((c, index) => (
        <section key={index} aria-label={`Joint loads of case ${c.id}`}>
          <h4 className="pp-label">
            Joint loads, case <span className="pp-num normal-case">{c.id || index + 1}</span>
          </h4>
          <InputTable
            columns={columns.loads}
            rows={c.loads}
            onChange={(rows) => setLoads(index, rows)}
            errors={errorsForTable(fieldErrors, `loadCases[${index}].loads`)}
            readOnly={readOnly}
            caption={`Joint loads of case ${c.id}`}
            addLabel={`Add load to case ${c.id}`}
            rowName={(_, i) => `load ${i + 1} in case ${c.id}`}
          />
        </section>
      ))}
      <section aria-label="Line loads">
        <h4 className="pp-label">Line loads on a chord</h4>
        <InputTable
          columns={columns.lineLoads}
          rows={lineLoadRows(draft.lineLoads ?? [])}
          onChange={(rows) => onChange({ lineLoads: lineLoadsFromRows(rows) })}
          errors={errorsForTable(fieldErrors, "lineLoads")}
          readOnly={readOnly}
          caption="Line loads"
          addLabel="Add line load"
          rowName={(r, i) => `line load ${i + 1} in case ${r.case}`}
        />
        <p className="mt-1 text-xs text-ink-faint">
          w acts downward and is shared among the chord&apos;s panel points by tributary length, on plan or along the chord.
        </p>
      </section>
    </div>
  );
}
