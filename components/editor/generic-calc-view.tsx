"use client";

import type { NodeViewProps } from "@tiptap/react";
import { useState } from "react";
import { StepList } from "@/components/math/step-list";
import type { CalcKind, CalcValue } from "@/lib/calcs/calc-types";
import { CalcFrame } from "./calc-frame";
import { useCalcNode } from "./use-calc-node";

/**
 * A calc shown by its inputs as JSON and its working and values: the fallback
 * for kinds whose dedicated form is not written yet, still fully live.
 */
export function GenericCalcView(props: NodeViewProps) {
  const kind = props.node.type.name as CalcKind;
  const calc = useCalcNode<unknown>(props);
  const [text, setText] = useState(() => JSON.stringify(calc.inputs, null, 2));
  const [parseError, setParseError] = useState<string | null>(null);
  const quantities = Object.entries(calc.result?.exports ?? {}).filter((e): e is [string, Extract<CalcValue, { type: "quantity" }>] => e[1].type === "quantity");
  return (
    <CalcFrame kind={kind} label={calc.label} result={calc.result} editable={calc.editable} selected={props.selected} onRename={calc.rename}>
      <label className="block">
        <span className="pp-label">Inputs</span>
        <textarea
          className="pp-input min-h-24 font-mono text-xs"
          value={text}
          readOnly={!calc.editable}
          aria-invalid={Boolean(parseError) || Boolean(calc.result?.fieldErrors.length)}
          onChange={(e) => {
            setText(e.target.value);
            try {
              calc.setInputs(JSON.parse(e.target.value));
              setParseError(null);
            } catch (err) {
              setParseError(err instanceof Error ? err.message : "Not valid JSON");
            }
          }}
        />
      </label>
      {parseError && <p className="pp-error">{parseError}</p>}
      {calc.result?.fieldErrors.map((f) => (
        <p key={f.path} className="pp-error">
          {f.path}: {f.message}
        </p>
      ))}
      {calc.result && <StepList steps={calc.result.steps} defaultCollapsed />}
      {quantities.length > 0 && (
        <table className="pp-table">
          <tbody>
            {quantities.slice(0, 40).map(([name, q]) => (
              <tr key={name}>
                <td className="pp-num">{calc.label}.{name}</td>
                <td className="pp-num text-right">{q.value.toPrecision(4)} {q.unit}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </CalcFrame>
  );
}
