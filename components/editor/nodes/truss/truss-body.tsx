"use client";

import { memo, useMemo, useState } from "react";
import type { CalcResult, TrussValue } from "@/lib/calcs/calc-types";
import type { TrussView } from "@/lib/calcs/truss/truss-view";
import { caseSteps } from "./case-steps";
import { convertDraftUnits } from "./convert-draft-units";
import { draftModel } from "./draft-model";
import { invalidParts } from "./invalid-parts";
import { readTrussDraft, type TrussDraft } from "./truss-draft";
import { TrussInputTabs } from "./truss-input-tabs";
import { TrussResults } from "./truss-results";
import { UnitsLine } from "./units-line";

export type TrussBodyProps = {
  label: string;
  /** The node's inputs as stored (perhaps not valid yet). */
  inputs: unknown;
  result: CalcResult | undefined;
  editable: boolean;
  packageSystem: "SI" | "US";
  setInputs: (next: unknown) => void;
};

/**
 * The Truss calc's body: units, input tabs, and the results of the chosen case.
 * Memoised, so a keystroke in another calc does not redraw these tables.
 */
export const TrussBody = memo(function TrussBody({ label, inputs, result, editable, packageSystem, setInputs }: TrussBodyProps) {
  const draft = useMemo(() => readTrussDraft(inputs), [inputs]);
  const view = (result?.view ?? null) as TrussView | null;
  const exported = result?.exports.model;
  const solved: TrussValue | null = exported && exported.type === "truss" ? exported : null;
  const cases = useMemo(
    () => (view && view.cases.length > 0 ? view.cases.map((c) => ({ id: c.id, label: c.kind && c.kind !== c.id ? `${c.id} (${c.kind})` : c.id })) : draft.loadCases.map((c) => ({ id: c.id, label: c.id }))),
    [view, draft.loadCases],
  );
  const [chosen, setChosen] = useState<string | null>(null);
  const caseId = cases.find((c) => c.id === chosen)?.id ?? cases[0]?.id ?? "";
  const fieldErrors = useMemo(() => result?.fieldErrors ?? [], [result]);
  const drawn = useMemo(() => draftModel(draft), [draft]);
  const invalid = useMemo(() => invalidParts(fieldErrors, draft), [fieldErrors, draft]);
  const steps = useMemo(() => (solved ? caseSteps(solved, result?.steps ?? [], caseId) : []), [solved, result, caseId]);
  // Patches go onto the stored inputs, so fields this view does not draw are kept exactly as they are.
  const base = typeof inputs === "object" && inputs !== null ? inputs : {};
  const update = (patch: Partial<TrussDraft>) => setInputs({ ...base, ...patch });

  return (
    <>
      <UnitsLine units={draft.units} packageSystem={packageSystem} readOnly={!editable} onChange={(units) => update(convertDraftUnits(draft, units))} />
      <TrussInputTabs label={label} draft={draft} fieldErrors={fieldErrors} readOnly={!editable} onChange={update} />
      <TrussResults label={label} solved={solved} draftModel={drawn} view={view} steps={steps} cases={cases} caseId={caseId} onCase={setChosen} invalid={invalid} />
    </>
  );
});
