"use client";

import type { NodeViewProps } from "@tiptap/react";
import { useMemo } from "react";
import { designUnits } from "@/lib/calcs/member-design/design-units";
import type { MemberDesignView as MemberDesignViewData } from "@/lib/calcs/member-design/member-design-view";
import { CalcFrame } from "../../calc-frame";
import { useCalcContext } from "../../calc-context";
import { useCalcNode } from "../../use-calc-node";
import { FieldErrorList } from "../combinations/field-error-list";
import { trussChoices, trussOptions, trussValueOf } from "../combinations/truss-choices";
import { forceSourceOptions } from "./force-source-options";
import { MemberDesignControls } from "./member-design-controls";
import { memberDesignSummary } from "./member-design-summary";
import { memberFormPaths } from "./member-form-paths";
import { changeMaterial, readMemberDesignInputs, toMemberDesignInputs, type MemberDesignForm } from "./member-rows";
import { MemberRowsEditor } from "./member-rows-editor";
import { MemberWorking } from "./member-working";
import { UtilizationTable } from "./utilization-table";

/** A Member design calc: the members, their sections and materials, and the utilization of each with its working. */
export function MemberDesignView(props: NodeViewProps) {
  const calc = useCalcNode<unknown>(props);
  const { evaluation } = useCalcContext();
  const form = readMemberDesignInputs(calc.inputs);
  const readOnly = !calc.editable;
  const errors = calc.result?.fieldErrors ?? [];
  const raw = calc.result?.view;
  const view = isMemberDesignView(raw) ? raw : null;
  const choices = useMemo(() => trussChoices(evaluation.results, ["truss", "combinations"]), [evaluation.results]);
  const truss = trussValueOf(evaluation.results, form.truss);
  // Sections and strengths are typed in the design units of the standard: N, mm, MPa; kip, in, ksi; or lbf, in, psi for US timber.
  const unitsFor = (material: MemberDesignForm["material"]) => designUnits({ force: truss?.model.units?.force ?? "kN", length: truss?.model.units?.length ?? "m" }, material);
  const units = unitsFor(form.material);
  const paths = memberFormPaths(form);
  const save = (next: MemberDesignForm) => calc.setInputs(toMemberDesignInputs(next));

  return (
    <CalcFrame
      calcId={calc.id}
      kind="memberDesign"
      label={calc.label}
      result={calc.result}
      editable={calc.editable}
      selected={props.selected}
      onRename={calc.rename}
      summary={view ? memberDesignSummary(view) : undefined}
    >
      <MemberDesignControls
        truss={form.truss}
        source={form.source}
        material={form.material}
        trussOptions={trussOptions(choices, form.truss)}
        sourceOptions={forceSourceOptions(evaluation.results, form.truss, truss, form.source)}
        errors={errors}
        readOnly={readOnly}
        onTruss={(t) => save({ ...form, truss: t })}
        onSource={(source) => save({ ...form, source })}
        onMaterial={(m) => save(changeMaterial(form, m, unitsFor(m).system))}
      />
      <MemberRowsEditor
        form={form}
        trussMembers={truss?.model.members.map((m) => m.id) ?? []}
        system={units.system}
        units={{ length: units.length, stress: units.stress }}
        errors={errors}
        readOnly={readOnly}
        onChange={save}
      />
      <FieldErrorList errors={errors} shownOnField={(p) => paths.has(p)} />
      {view && (
        <section aria-label="Utilization per member">
          <h4 className="pp-label">
            Utilization <span className="normal-case tracking-normal text-ink-faint">(forces from {view.source})</span>
          </h4>
          <UtilizationTable rows={view.rows} force={view.units.force} slenderness={view.material === "timber-nds" ? "le/d" : "KL/r"} />
        </section>
      )}
      {view && calc.result && <MemberWorking steps={calc.result.steps} rows={view.rows} />}
    </CalcFrame>
  );
}

function isMemberDesignView(v: unknown): v is MemberDesignViewData {
  return typeof v === "object" && v !== null && Array.isArray((v as { rows?: unknown }).rows);
}
