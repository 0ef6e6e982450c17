import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { TrussDiagram, type TrussDiagramProps } from "../../../components/diagrams/truss-diagram";
import type { CalcNode, CalcResult, TrussValue } from "../../calcs/calc-types";
import type { DeflectionView } from "../../calcs/deflection/deflection-view";
import type { JointView } from "../../calcs/joint/joint-view";
import type { SectionCutView } from "../../calcs/section-cut/section-cut-view";

const PRINT = { background: "#ffffff", width: 720, maxHeight: 340 } as const;

/**
 * The diagram a calc's editor view draws, as static SVG for the sheet: the
 * truss for a Truss calc (first case, forces and reactions), the free body
 * for a Section cut, the joint for a Joint calc, the joint deflected for a
 * Deflection calc. Kinds the editor draws no diagram for give null.
 */
export function calcDiagramSvg(calc: CalcNode, result: CalcResult | undefined, trussOf: (label: string) => TrussValue | null): string | null {
  const props = diagramProps(calc, result, trussOf);
  return props ? renderToStaticMarkup(createElement(TrussDiagram, { ...PRINT, ...props })) : null;
}

function diagramProps(calc: CalcNode, result: CalcResult | undefined, trussOf: (label: string) => TrussValue | null): TrussDiagramProps | null {
  const ok = result?.status === "ok";
  if (calc.kind === "truss") {
    const own = ok ? trussOf(calc.label) : null;
    if (!own) return null;
    const caseId = own.cases[0];
    return { model: own.model, result: own.solution.cases[caseId], loadCaseId: caseId ?? null, showReactions: true, title: `${calc.label}: truss, case ${caseId}` };
  }
  if (!ok) return null;
  const view = result.view as { truss?: string; loadCase?: string } | null;
  const source = view?.truss ? trussOf(view.truss) : null;
  if (!source || !view?.loadCase) return null;
  const base = { model: source.model, result: source.solution.cases[view.loadCase], loadCaseId: view.loadCase, showReactions: true };
  if (calc.kind === "sectionCut") {
    const v = result.view as SectionCutView;
    return { ...base, cutMembers: v.members, keptJoints: v.keptJoints, highlightMembers: v.members, title: `${calc.label}: free body of ${v.truss}, case ${v.loadCase}` };
  }
  if (calc.kind === "joint") {
    const v = result.view as JointView;
    return { ...base, highlightJoints: v.mode === "joint" ? [v.joint] : undefined, highlightMembers: v.rows.map((r) => r.member), title: `${calc.label}: joint equilibrium of ${v.truss}, case ${v.loadCase}` };
  }
  if (calc.kind === "deflection") {
    const v = result.view as DeflectionView;
    return { ...base, highlightJoints: [v.joint], title: `${calc.label}: deflection of ${v.joint}, case ${v.loadCase}` };
  }
  return null;
}
