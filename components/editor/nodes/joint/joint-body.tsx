"use client";

import { memo, useMemo } from "react";
import { TrussDiagram } from "@/components/diagrams/truss-diagram";
import { StepList } from "@/components/math/step-list";
import type { CalcResult } from "@/lib/calcs/calc-types";
import type { JointView } from "@/lib/calcs/joint/joint-view";
import { FieldProblems } from "../truss/field-problems";
import { TrussSourcePicker } from "../truss/truss-source-picker";
import type { TrussSource } from "../truss/truss-sources";
import { readJointDraft, type JointDraft } from "./joint-draft";
import { JointForcesTable } from "./joint-forces-table";
import { JointModePicker } from "./joint-mode-picker";
import { JointOutcome } from "./joint-outcome";
import { KnownForcesTable } from "./known-forces-table";
import { zeroForceInspection } from "./zero-force-inspection";
import { ZeroForceList } from "./zero-force-list";

export type JointBodyProps = {
  label: string;
  inputs: unknown;
  result: CalcResult | undefined;
  sources: readonly TrussSource[];
  editable: boolean;
  setInputs: (next: unknown) => void;
};

/**
 * The Joint calc's body: which truss, case and joint (or the whole truss in
 * order), the known forces carried in, ΣFx and ΣFy with the numbers in, the
 * forces found with tension or compression, and zero-force members by
 * inspection with the rule that shows each.
 */
export const JointBody = memo(function JointBody({ label, inputs, result, sources, editable, setInputs }: JointBodyProps) {
  const draft = useMemo(() => readJointDraft(inputs), [inputs]);
  const view = (result?.status === "ok" ? result.view : null) as JointView | null;
  const errors = result?.fieldErrors ?? [];
  const source = sources.find((s) => s.label === draft.truss)?.value ?? null;
  const caseId = view?.loadCase ?? (draft.loadCase || source?.model.loadCases[0]?.id || "");
  const zero = useMemo(() => (source && caseId ? zeroForceInspection(source.model, caseId) : null), [source, caseId]);
  const base = typeof inputs === "object" && inputs !== null ? inputs : {};
  const update = (patch: Partial<JointDraft>) => setInputs({ ...base, ...patch });
  const unit = source?.model.units?.force ?? "kN";
  const found = view?.rows.map((r) => r.member) ?? [];

  return (
    <>
      <TrussSourcePicker sources={sources} truss={draft.truss} loadCase={draft.loadCase} readOnly={!editable} onChange={(next) => update(next.truss === draft.truss ? next : { ...next, known: {} })} />
      <FieldProblems errors={errors} field="truss" />
      <FieldProblems errors={errors} field="loadCase" />
      {source && (
        <>
          <JointModePicker sequence={draft.sequence} joint={draft.joint} joints={source.model.joints.map((j) => j.id)} readOnly={!editable} onChange={update} />
          <FieldProblems errors={errors} field="joint" />
          <FieldProblems errors={errors} field="sequence" />
          <div data-testid="joint-diagram">
            <TrussDiagram
              model={source.model}
              result={source.solution.cases[caseId]}
              loadCaseId={caseId || null}
              title={`${label}: ${draft.sequence ? "every joint" : `joint ${draft.joint}`} of ${draft.truss}, case ${caseId}`}
              highlightJoints={draft.sequence ? undefined : [draft.joint]}
              highlightMembers={found}
              showReactions
            />
          </div>
          <KnownForcesTable known={draft.known} unit={unit} readOnly={!editable} onChange={(known) => update({ known })} />
          <FieldProblems errors={errors} field="known" />
        </>
      )}
      {result && result.steps.length > 0 && (
        <section aria-label="Equilibrium">
          <h4 className="pp-label">Equilibrium, ΣFx = 0 and ΣFy = 0</h4>
          <StepList steps={result.steps} />
        </section>
      )}
      {view && (
        <>
          <JointForcesTable rows={view.rows} unit={view.units.force} caption={`Forces found, case ${view.loadCase} (tension positive)`} />
          <JointOutcome view={view} />
        </>
      )}
      {zero && <ZeroForceList inspection={zero} caseId={caseId} />}
    </>
  );
});
