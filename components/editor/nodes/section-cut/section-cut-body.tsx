"use client";

import { memo, useMemo, useState } from "react";
import { TrussDiagram } from "@/components/diagrams/truss-diagram";
import { StepList } from "@/components/math/step-list";
import type { CalcResult } from "@/lib/calcs/calc-types";
import type { SectionCutView } from "@/lib/calcs/section-cut/section-cut-view";
import { FieldProblems } from "../truss/field-problems";
import { TrussSourcePicker } from "../truss/truss-source-picker";
import type { TrussSource } from "../truss/truss-sources";
import { CutAgreementLine } from "./cut-agreement-line";
import { CutForcesTable } from "./cut-forces-table";
import { CutMemberList } from "./cut-member-list";
import { CutProposalList } from "./cut-proposal-list";
import { KeepSidePicker } from "./keep-side-picker";
import { readSectionCutDraft, type SectionCutDraft } from "./section-cut-draft";
import { toggleCutMember } from "./toggle-cut-member";

export type SectionCutBodyProps = {
  label: string;
  inputs: unknown;
  result: CalcResult | undefined;
  sources: readonly TrussSource[];
  editable: boolean;
  setInputs: (next: unknown) => void;
};

/**
 * The Section cut calc's body: which truss and case, the members cut (by
 * clicking the diagram, from the list, or a proposed cut), the side kept, the
 * free body, each cut force with how it was found, and the check against the
 * full solution.
 */
export const SectionCutBody = memo(function SectionCutBody({ label, inputs, result, sources, editable, setInputs }: SectionCutBodyProps) {
  const draft = useMemo(() => readSectionCutDraft(inputs), [inputs]);
  const [proposing, setProposing] = useState(false);
  const view = (result?.status === "ok" ? result.view : null) as SectionCutView | null;
  const errors = result?.fieldErrors ?? [];
  const source = sources.find((s) => s.label === draft.truss)?.value ?? null;
  const caseId = view?.loadCase ?? (draft.loadCase || source?.model.loadCases[0]?.id || "");
  const cut = view?.members ?? draft.members;
  const base = typeof inputs === "object" && inputs !== null ? inputs : {};
  const update = (patch: Partial<SectionCutDraft>) => setInputs({ ...base, ...patch });
  // From the cut in use, so a click on a proposed cut adjusts it rather than starting again.
  const toggle = (member: string) => update({ members: toggleCutMember(cut, member) });
  // Members and side belong to the truss they were picked on.
  const pickSource = (next: { truss: string; loadCase: string }) => update(next.truss === draft.truss ? next : { ...next, members: [], keep: "" });

  return (
    <>
      <TrussSourcePicker sources={sources} truss={draft.truss} loadCase={draft.loadCase} readOnly={!editable} onChange={pickSource} />
      <FieldProblems errors={errors} field="truss" />
      <FieldProblems errors={errors} field="loadCase" />
      {source && (
        <div className="space-y-3">
          <div data-testid="free-body-diagram">
            <TrussDiagram
              model={source.model}
              result={source.solution.cases[caseId]}
              loadCaseId={caseId || null}
              title={`${label}: free body of ${draft.truss}, case ${caseId}`}
              cutMembers={view ? view.members : undefined}
              keptJoints={view ? view.keptJoints : undefined}
              highlightMembers={cut}
              showReactions
              onMemberClick={editable ? toggle : undefined}
            />
          </div>
          {editable && <p className="text-xs text-ink-faint">Click members on the diagram, or tick them below, to cut them.</p>}
          <CutMemberList members={source.model.members.map((m) => m.id)} cut={cut} readOnly={!editable} onToggle={toggle} />
          <FieldProblems errors={errors} field="members" />
          {view?.proposed && view.description && <p className="text-sm">Proposed cut: {view.description}</p>}
          {proposing || draft.members.length === 0 ? (
            <CutProposalList
              model={source.model}
              panel={draft.panel}
              readOnly={!editable}
              onPanel={(panel) => update({ panel, members: [] })}
              onUse={(c) => { update({ members: c.members, keep: c.keep }); setProposing(false); }}
            />
          ) : (
            editable && <button type="button" className="pp-btn-quiet px-2 py-0.5 text-xs" onClick={() => setProposing(true)}>Propose a cut…</button>
          )}
          <FieldProblems errors={errors} field="panel" />
          <KeepSidePicker joints={source.model.joints.map((j) => j.id)} keep={view?.keep ?? draft.keep} keptJoints={view?.keptJoints ?? []} readOnly={!editable} onKeep={(keep) => update({ keep })} />
          <FieldProblems errors={errors} field="keep" />
        </div>
      )}
      {view && (
        <>
          <CutForcesTable view={view} />
          <CutAgreementLine view={view} />
        </>
      )}
      {result && <StepList steps={result.steps} />}
    </>
  );
});
