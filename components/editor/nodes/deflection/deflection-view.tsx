"use client";

import type { NodeViewProps } from "@tiptap/react";
import { useMemo } from "react";
import { StepList } from "@/components/math/step-list";
import type { DeflectionView as DeflectionViewData } from "@/lib/calcs/deflection/deflection-view";
import { CalcFrame } from "../../calc-frame";
import { useCalcContext } from "../../calc-context";
import { useCalcNode } from "../../use-calc-node";
import { FieldErrorList } from "../combinations/field-error-list";
import { formatQuantity } from "../combinations/format-figure";
import { trussChoices, trussOptions, trussValueOf } from "../combinations/truss-choices";
import { DeflectionCheck } from "./deflection-check";
import { DeflectionControls } from "./deflection-controls";
import { readDeflectionInputs } from "./read-deflection-inputs";
import { VirtualWorkTable } from "./virtual-work-table";
import { virtualWorkTable } from "./virtual-work-rows";

const OWN_FIELDS = new Set(["truss", "loadCase", "joint", "direction", "limitRatio", "span"]);

/** A Deflection calc: joint deflection by virtual work against a span ratio, cross-checked with the stiffness solution. */
export function DeflectionView(props: NodeViewProps) {
  const calc = useCalcNode<unknown>(props);
  const { evaluation } = useCalcContext();
  const inputs = readDeflectionInputs(calc.inputs);
  const errors = calc.result?.fieldErrors ?? [];
  const raw = calc.result?.view;
  const view = isDeflectionView(raw) ? raw : null;
  const choices = useMemo(() => trussChoices(evaluation.results, ["truss", "combinations"]), [evaluation.results]);
  const truss = trussValueOf(evaluation.results, inputs.truss);
  const table = useMemo(() => (view ? virtualWorkTable(view, truss?.model ?? null) : null), [view, truss]);
  const summary = view ? `δ = ${formatQuantity(view.value, view.units.deflection)} ${view.sense}; allowable ${formatQuantity(view.allowable, view.units.deflection)}: ${view.pass ? "PASS ✓" : "FAIL ✕"}` : undefined;

  return (
    <CalcFrame calcId={calc.id} kind="deflection" label={calc.label} result={calc.result} editable={calc.editable} selected={props.selected} onRename={calc.rename} summary={summary}>
      <DeflectionControls inputs={inputs} truss={truss} trussOptions={trussOptions(choices, inputs.truss)} errors={errors} readOnly={!calc.editable} onChange={calc.setInputs} />
      <FieldErrorList errors={errors} shownOnField={(p) => OWN_FIELDS.has(p)} />
      {view && <DeflectionCheck view={view} />}
      {view && table && (
        <details open>
          <summary className="cursor-pointer text-xs text-ink-soft">Virtual work table ({table.rows.length} members)</summary>
          <div className="mt-2">
            <VirtualWorkTable table={table} symbol={`δ${view.direction} at ${view.joint}`} />
          </div>
        </details>
      )}
      {calc.result && <StepList steps={calc.result.steps} defaultCollapsed />}
    </CalcFrame>
  );
}

function isDeflectionView(v: unknown): v is DeflectionViewData {
  return typeof v === "object" && v !== null && Array.isArray((v as { terms?: unknown }).terms);
}
