"use client";

import { TrussDiagram } from "@/components/diagrams/truss-diagram";
import { StepList } from "@/components/math/step-list";
import type { TrussValue } from "@/lib/calcs/calc-types";
import type { TrussView } from "@/lib/calcs/truss/truss-view";
import type { Step, TrussModel } from "@/lib/solve";
import { CaseSelect } from "./case-select";
import type { InvalidParts } from "./invalid-parts";
import { MemberForcesTable } from "./member-forces-table";
import { ReactionsTable } from "./reactions-table";

export type TrussResultsProps = {
  label: string;
  /** The solved truss when the inputs solve; else null and `draftModel` is drawn. */
  solved: TrussValue | null;
  draftModel: TrussModel;
  view: TrussView | null;
  /** Global equilibrium steps of the chosen case. */
  steps: readonly Step[];
  cases: readonly { id: string; label: string }[];
  caseId: string;
  onCase: (id: string) => void;
  invalid: InvalidParts;
};

/**
 * The diagram to scale for the chosen case, determinacy and stability in
 * words, the case's reactions and member forces, and the global equilibrium
 * steps for the reactions. Before the truss solves, the diagram draws what
 * is entered with the wrong parts marked.
 */
export function TrussResults({ label, solved, draftModel, view, steps, cases, caseId, onCase, invalid }: TrussResultsProps) {
  const caseView = view?.cases.find((c) => c.id === caseId);
  const model = solved?.model ?? draftModel;
  const result = solved?.solution.cases[caseId];
  const unit = view?.units.force ?? "";
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-3">
        <CaseSelect cases={cases} value={caseId} onChange={onCase} />
        {view && (
          <p className={`text-sm ${view.stable ? "text-ink" : "text-compression"}`} data-testid="truss-stability">
            {view.stable ? "✓ " : "✕ "}
            {view.stability}
          </p>
        )}
      </div>
      <div data-testid="truss-diagram" data-case={caseId} data-solved={result ? "true" : "false"}>
        <TrussDiagram
          model={model}
          result={result}
          loadCaseId={cases.some((c) => c.id === caseId) ? caseId : null}
          title={`${label}: truss${caseId ? `, case ${caseId}` : ""}`}
          invalidJoints={invalid.joints}
          invalidMembers={invalid.members}
          showReactions={result !== undefined}
          // Before solving the key still has a job: saying what the error marks mean.
          showLegend={result !== undefined || invalid.joints.length + invalid.members.length > 0}
        />
      </div>
      {caseView && (
        <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,2fr)]">
          <ReactionsTable caseView={caseView} unit={unit} />
          <MemberForcesTable caseView={caseView} unit={unit} />
        </div>
      )}
      {steps.length > 0 && (
        <section aria-label="Global equilibrium">
          <h4 className="pp-label">Reactions by global equilibrium, case {caseId}</h4>
          <StepList steps={steps} defaultCollapsed />
        </section>
      )}
    </div>
  );
}
