"use client";

import { InputTable } from "@/components/editor/input-table/input-table";
import type { CalcFieldError } from "@/lib/calcs/calc-types";
import { factorColumns, factorErrors, factorRows, factorSetsFromRows, type FactorRow, type FactorSet } from "./custom-factor-rows";

export type CustomFactorsEditorProps = {
  sets: readonly FactorSet[];
  caseIds: readonly string[];
  onChange: (sets: FactorSet[]) => void;
  errors: readonly CalcFieldError[];
  readOnly: boolean;
};

/** The author's own combinations: one row each, a factor per load case (blank is 0). */
export function CustomFactorsEditor({ sets, caseIds, onChange, errors, readOnly }: CustomFactorsEditorProps) {
  if (caseIds.length === 0) return <p className="text-sm text-ink-faint">Factors can be entered once the truss has load cases.</p>;
  const newRow = (rows: readonly FactorRow[]): FactorRow => ({ name: `Combination ${rows.length + 1}` });
  return (
    <div>
      <p className="pp-label">Custom factor sets</p>
      <InputTable<FactorRow>
        caption="Custom factor sets"
        columns={factorColumns(caseIds)}
        rows={factorRows(sets, caseIds)}
        onChange={(rows) => onChange(factorSetsFromRows(rows, caseIds, sets))}
        errors={factorErrors(errors, caseIds)}
        readOnly={readOnly}
        newRow={newRow}
        rowName={(r, i) => (typeof r.name === "string" && r.name ? `combination ${r.name}` : `combination ${i + 1}`)}
        addLabel="Add combination"
      />
      <p className="mt-1 text-xs text-ink-faint">A blank factor is 0: that case is left out of the combination.</p>
    </div>
  );
}
