"use client";

import type { NodeViewProps } from "@tiptap/react";
import { useMemo } from "react";
import { StepList } from "@/components/math/step-list";
import type { CombinationsView as CombinationsViewData } from "@/lib/calcs/combinations/combinations-view";
import { CalcFrame } from "../../calc-frame";
import { useCalcContext } from "../../calc-context";
import { useCalcNode } from "../../use-calc-node";
import { CaseKindsTable } from "./case-kinds-table";
import { CombinationListTable } from "./combination-list-table";
import { kindsCombined, readStandard, standardName, standardOptions, usesPsi0 } from "./combination-standards";
import { combinationsSummary } from "./combinations-summary";
import { CustomFactorsEditor } from "./custom-factors-editor";
import { fieldErrorAt } from "./field-error-at";
import { FieldErrorList } from "./field-error-list";
import { GoverningTable } from "./governing-table";
import { ReactionEnvelopeTable } from "./reaction-envelope-table";
import { readCombinationsInputs } from "./read-combinations-inputs";
import { SelectField } from "./select-field";
import { trussChoices, trussOptions, trussValueOf } from "./truss-choices";

/** The fields this form shows errors on itself (the pickers, and the cells of the custom table); the rest are listed. */
const OWN_FIELDS = /^(truss|standard)$|^custom\[\d+\]\.(name|factors)/;

/** A Combinations calc: the truss and the set, the combinations generated, and the governing combination per member. */
export function CombinationsView(props: NodeViewProps) {
  const calc = useCalcNode<unknown>(props);
  const { evaluation } = useCalcContext();
  const inputs = readCombinationsInputs(calc.inputs);
  const readOnly = !calc.editable;
  const errors = calc.result?.fieldErrors ?? [];
  const raw = calc.result?.view;
  const view = isCombinationsView(raw) ? raw : null;
  const choices = useMemo(() => trussChoices(evaluation.results), [evaluation.results]);
  const truss = trussValueOf(evaluation.results, inputs.truss);
  const cases = view?.cases ?? (truss?.cases ?? []).map((id) => ({ id, kind: truss?.caseKinds?.[id] ?? id }));
  const caseIds = cases.map((c) => c.id);
  const standard = readStandard(inputs.standard);
  const setName = standardName(standard);

  const setPsi0 = (id: string, v: number | undefined) => {
    const next = { ...inputs.psi0 };
    if (v === undefined) delete next[id];
    else next[id] = v;
    // An empty record is dropped rather than stored, so the inputs read as the set's defaults.
    const rest = { truss: inputs.truss, standard: inputs.standard, ...(inputs.custom ? { custom: inputs.custom } : {}) };
    calc.setInputs(Object.keys(next).length > 0 ? { ...rest, psi0: next } : rest);
  };

  return (
    <CalcFrame calcId={calc.id} kind="combinations" label={calc.label} result={calc.result} editable={calc.editable} selected={props.selected} onRename={calc.rename} summary={view ? combinationsSummary(view, setName) : undefined}>
      <div className="grid gap-3 sm:grid-cols-[10rem_1fr]">
        <SelectField label="Truss calc" value={inputs.truss} options={trussOptions(choices, inputs.truss)} onChange={(t) => calc.setInputs({ ...inputs, truss: t })} readOnly={readOnly} error={fieldErrorAt(errors, "truss")} />
        <SelectField
          label="Combination set"
          value={standard}
          options={standardOptions}
          onChange={(s) => {
            const next = readStandard(s);
            // Custom factors start with one set per load case alone (factor 1), which the author edits.
            const custom = next === "custom" && !(inputs.custom && inputs.custom.length > 0) ? caseIds.map((id) => ({ name: `${id} alone`, factors: { [id]: 1 } })) : inputs.custom;
            calc.setInputs({ ...inputs, standard: next, ...(custom ? { custom } : {}) });
          }}
          readOnly={readOnly}
          error={fieldErrorAt(errors, "standard")}
        />
      </div>
      <CaseKindsTable
        trussLabel={inputs.truss}
        cases={cases}
        combined={kindsCombined(standard)}
        setName={setName}
        psi0={usesPsi0(standard) ? (inputs.psi0 ?? {}) : undefined}
        onPsi0={setPsi0}
        readOnly={readOnly}
      />
      {standard === "custom" && (
        <CustomFactorsEditor sets={inputs.custom ?? []} caseIds={caseIds} onChange={(custom) => calc.setInputs({ ...inputs, custom })} errors={errors} readOnly={readOnly} />
      )}
      <FieldErrorList errors={errors} shownOnField={(p) => OWN_FIELDS.test(p) && (standard === "custom" || !p.startsWith("custom"))} />
      {view && (
        <>
          <section aria-label="Combinations applied">
            <h4 className="pp-label">Combinations applied ({view.combinations.length})</h4>
            <CombinationListTable combinations={view.combinations} caseIds={caseIds} />
          </section>
          <section aria-label="Governing combination per member">
            <h4 className="pp-label">Governing combination per member</h4>
            <GoverningTable members={view.members} force={view.units.force} />
          </section>
          <details>
            <summary className="cursor-pointer text-xs text-ink-soft">Support reactions ({view.reactions.length})</summary>
            <div className="mt-2">
              <ReactionEnvelopeTable reactions={view.reactions} force={view.units.force} />
            </div>
          </details>
        </>
      )}
      {calc.result && <StepList steps={calc.result.steps} defaultCollapsed />}
    </CalcFrame>
  );
}

function isCombinationsView(v: unknown): v is CombinationsViewData {
  return typeof v === "object" && v !== null && Array.isArray((v as { members?: unknown }).members) && Array.isArray((v as { combinations?: unknown }).combinations);
}
