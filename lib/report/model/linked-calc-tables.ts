import type { DeflectionInputs } from "../../calcs/deflection/deflection-inputs";
import type { DeflectionView } from "../../calcs/deflection/deflection-view";
import type { JointInputs } from "../../calcs/joint/joint-inputs";
import type { JointView } from "../../calcs/joint/joint-view";
import type { SectionCutInputs } from "../../calcs/section-cut/section-cut-inputs";
import type { SectionCutView } from "../../calcs/section-cut/section-cut-view";
import type { ReportTable } from "../report-model";
import { fixed, senseMark } from "./format-quantity";
import { parameters, table } from "./table";

const agreement = (a: boolean | null) => (a === null ? "—" : a ? "agrees" : "differs");

/** A Section cut's inputs and the forces it finds, beside the full solution. */
export function sectionCutTables(inputs: SectionCutInputs, view: SectionCutView | null): ReportTable[] {
  const out = [
    parameters("Section", [
      ["Truss", inputs.truss],
      ["Load case", view?.loadCase ?? (inputs.loadCase || "first case")],
      ["Members cut", (view?.members ?? inputs.members).join(", ") || "proposed"],
      ["Proposed cut", view?.proposed ? (view.description ?? "yes") : null],
      ["Free body (joints kept)", view ? view.keptJoints.join(", ") : inputs.keep || null],
    ]),
  ];
  if (view) {
    const f = view.units.force;
    out.push(table("Cut member forces", ["Member", `N (${f})`, "Sense", "Found by", `Stiffness (${f})`, "Check"], view.rows.map((r) => [r.member, fixed(r.force, 2), senseMark(r.sense), r.method === "moment" ? "moments" : "force sum", fixed(r.stiffness, 2), agreement(r.agrees)])));
  }
  return out;
}

/** A Joint calc's inputs and the forces found joint by joint. */
export function jointTables(inputs: JointInputs, view: JointView | null): ReportTable[] {
  const out = [
    parameters("Joint equilibrium", [
      ["Truss", inputs.truss],
      ["Load case", view?.loadCase ?? (inputs.loadCase || "first case")],
      ["Joint", inputs.sequence ? "every joint, in a solvable order" : inputs.joint],
      ["Order solved", view?.mode === "sequence" ? view.order.join(" → ") : null],
      ["Known forces", inputs.known && Object.keys(inputs.known).length ? Object.entries(inputs.known).map(([m, v]) => `${m} = ${fixed(v, 2)}`).join(", ") : null],
      ["Stopped because", view?.mode === "sequence" ? view.stuck : null],
    ]),
  ];
  if (view) {
    const f = view.units.force;
    out.push(table("Member forces found", ["Member", `N (${f})`, "Sense", `Stiffness (${f})`, "Check"], view.rows.map((r) => [r.member, fixed(r.force, 2), senseMark(r.sense), fixed(r.stiffness, 2), agreement(r.agrees)])));
  }
  return out;
}

/** A Deflection calc's inputs, the check against the limit and the virtual-work table. */
export function deflectionTables(inputs: DeflectionInputs, view: DeflectionView | null): ReportTable[] {
  const out = [
    parameters("Deflection", [
      ["Truss", inputs.truss],
      ["Load case", view?.loadCase ?? (inputs.loadCase || "first case")],
      ["Joint and direction", `${inputs.joint}, ${inputs.direction}`],
      ["Limit", `span / ${inputs.limitRatio}`],
      ["Span", view ? `${fixed(view.span, 3)} ${view.units.length}` : inputs.span === undefined ? "extent of the truss" : String(inputs.span)],
    ]),
  ];
  if (view) {
    const d = view.units.deflection;
    out.push(
      parameters("Check", [
        ["Deflection by virtual work", `${fixed(view.value, 2)} ${d} (${view.sense})`],
        ["Stiffness solution", view.stiffnessValue === null ? null : `${fixed(view.stiffnessValue, 2)} ${d} (${agreement(view.agrees)})`],
        ["Allowable", `${fixed(view.allowable, 2)} ${d}`],
        ["Utilization", `${fixed(view.utilization, 3)} — ${view.pass ? "OK" : "NOT OK"}`],
      ]),
      table("Virtual-work terms", ["Member", "N", "n", "L", "N·n·L / (A·E)"], view.terms.map((t) => [t.member, fixed(t.N, 2), fixed(t.n, 4), fixed(t.L, 3), fixed(t.contribution, 4)])),
    );
  }
  return out;
}
