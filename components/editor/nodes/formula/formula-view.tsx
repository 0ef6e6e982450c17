"use client";

import type { NodeViewProps } from "@tiptap/react";
import { useId, useMemo, useState } from "react";
import type { FormulaView as FormulaViewData } from "@/lib/calcs/formula/formula-view";
import { CalcFrame } from "../../calc-frame";
import { useCalcNode } from "../../use-calc-node";
import { FieldErrorList } from "../combinations/field-error-list";
import { SelectField } from "../combinations/select-field";
import { formulaErrorLines, isFormulaLinePath } from "./formula-error-lines";
import { formulaLineItems, formulaSummary } from "./formula-line-items";
import { FormulaLines } from "./formula-lines";
import { FormulaSourceEditor } from "./formula-source-editor";
import { readFormulaInputs } from "./read-formula-inputs";

const UNIT_OPTIONS = [
  { value: "SI", label: "SI (kN, m, MPa)" },
  { value: "US", label: "US customary (kip, ft, ksi)" },
];

/** A Formula calc: its lines as text, and each line typeset with its result or its problem, live. */
export function FormulaView(props: NodeViewProps) {
  const calc = useCalcNode<unknown>(props);
  const inputs = readFormulaInputs(calc.inputs);
  const linesId = useId();
  const [collapsed, setCollapsed] = useState(false);
  const fieldErrors = useMemo(() => calc.result?.fieldErrors ?? [], [calc.result]);
  const raw = calc.result?.view;
  const view = isFormulaView(raw) ? raw : null;
  const items = useMemo(() => formulaLineItems(inputs.source, view, fieldErrors), [inputs.source, view, fieldErrors]);
  const errorLines = useMemo(() => formulaErrorLines(fieldErrors), [fieldErrors]);

  return (
    <CalcFrame
      calcId={calc.id}
      kind="formula"
      label={calc.label}
      result={calc.result}
      editable={calc.editable}
      selected={props.selected}
      onRename={calc.rename}
      summary={items.length > 0 ? formulaSummary(items) : undefined}
    >
      <FormulaSourceEditor
        source={inputs.source}
        onChange={(source) => calc.setInputs({ ...inputs, source })}
        readOnly={!calc.editable}
        errorLines={errorLines}
        describedBy={errorLines.size > 0 ? linesId : undefined}
      />
      <SelectField
        className="max-w-xs"
        label="Results without -> unit in"
        value={inputs.preferredUnits}
        options={UNIT_OPTIONS}
        onChange={(v) => calc.setInputs({ ...inputs, preferredUnits: v === "US" ? "US" : "SI" })}
        readOnly={!calc.editable}
      />
      <FieldErrorList errors={fieldErrors} shownOnField={isFormulaLinePath} />
      {items.some((i) => i.kind === "value") && (
        <button type="button" className="pp-btn-quiet px-2 py-0.5 text-xs" aria-expanded={!collapsed} aria-controls={linesId} onClick={() => setCollapsed(!collapsed)}>
          {collapsed ? "Show working" : "Results only"}
        </button>
      )}
      <FormulaLines id={linesId} items={items} collapsed={collapsed} />
    </CalcFrame>
  );
}

function isFormulaView(v: unknown): v is FormulaViewData {
  return typeof v === "object" && v !== null && Array.isArray((v as { lines?: unknown }).lines);
}
