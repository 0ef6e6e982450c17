"use client";

import type { SelectOption } from "@/components/editor/input-table/input-column";
import type { CalcFieldError, TrussValue } from "@/lib/calcs/calc-types";
import { fieldErrorAt } from "../combinations/field-error-at";
import { formatFigure } from "../combinations/format-figure";
import { NumberField } from "../combinations/number-field";
import { SelectField } from "../combinations/select-field";
import { loadCaseOptions } from "../combinations/truss-choices";
import { LimitRatioField } from "./limit-ratio-field";
import { withOptional, type DeflectionForm } from "./read-deflection-inputs";

export type DeflectionControlsProps = {
  inputs: DeflectionForm;
  truss: TrussValue | null;
  trussOptions: readonly SelectOption[];
  errors: readonly CalcFieldError[];
  readOnly: boolean;
  onChange: (inputs: DeflectionForm) => void;
};

const DIRECTIONS: SelectOption[] = [
  { value: "y", label: "vertical (y, up positive)" },
  { value: "x", label: "horizontal (x, right positive)" },
];

/** Which deflection is checked: truss, case, joint and direction, and the limit it is held to. */
export function DeflectionControls({ inputs, truss, trussOptions, errors, readOnly, onChange }: DeflectionControlsProps) {
  const joints = (truss?.model.joints ?? []).map((j) => ({ value: j.id, label: j.id }));
  const xs = (truss?.model.joints ?? []).map((j) => j.x);
  const extent = xs.length > 1 ? Math.max(...xs) - Math.min(...xs) : undefined;
  const length = truss?.model.units?.length ?? "m";
  const set = (change: Partial<DeflectionForm>) => onChange({ ...inputs, ...change });
  return (
    <div className="grid grid-cols-[repeat(auto-fill,minmax(9rem,1fr))] items-start gap-3">
      <SelectField label="Truss calc" value={inputs.truss} options={trussOptions} onChange={(t) => set({ truss: t })} readOnly={readOnly} error={fieldErrorAt(errors, "truss")} />
      <SelectField label="Load case" value={inputs.loadCase} options={loadCaseOptions(truss, inputs.loadCase)} onChange={(c) => set({ loadCase: c })} readOnly={readOnly} error={fieldErrorAt(errors, "loadCase")} />
      <SelectField label="Joint" value={inputs.joint} options={joints} onChange={(j) => set({ joint: j })} readOnly={readOnly} error={fieldErrorAt(errors, "joint")} />
      <SelectField label="Direction" value={inputs.direction} options={DIRECTIONS} onChange={(d) => set({ direction: d === "x" ? "x" : "y" })} readOnly={readOnly} error={fieldErrorAt(errors, "direction")} />
      <LimitRatioField ratio={inputs.limitRatio} onChange={(r) => onChange(withOptional(inputs, "limitRatio", r))} readOnly={readOnly} error={fieldErrorAt(errors, "limitRatio")} />
      <NumberField
        label="Span L"
        name="span for the limit"
        unit={length}
        value={inputs.span}
        // Blank goes back to the truss's own extent: the field is left out rather than stored empty.
        onChange={(span) => onChange(withOptional(inputs, "span", span))}
        readOnly={readOnly}
        error={fieldErrorAt(errors, "span")}
        blankMeans={extent === undefined ? "the truss's extent" : `the truss's extent, ${formatFigure(extent)} ${length}`}
      />
    </div>
  );
}
