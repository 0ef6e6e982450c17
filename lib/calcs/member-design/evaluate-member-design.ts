import { texQty, type CheckMemberResult, type Step } from "../../solve";
import type { CalcFieldError, CalcValue } from "../calc-types";
import { errorEvaluation } from "../error-evaluation";
import { exportName } from "../export-name";
import { computedEvaluation, failedEvaluation, type KindEvaluation } from "../kind-evaluation";
import { quantityValue } from "../quantity-value";
import { readTrussValue } from "../read-truss-value";
import { texLabel } from "../tex-label";
import { designUnits } from "./design-units";
import type { MemberDesignInputs } from "./member-design-inputs";
import type { MemberCheckRow, MemberDesignView } from "./member-design-view";
import { memberForceSource, type MemberForceSource } from "./member-force-source";
import { runMemberCheck } from "./run-member-check";

/**
 * Axial checks of the listed members: length from the truss geometry, force
 * from the source (for a Combinations calc both the governing tension and the
 * governing compression are checked and the higher utilization kept).
 * Exports `U_<member>` and `U_max` (plain numbers).
 */
export function evaluateMemberDesign(inputs: MemberDesignInputs, resolved: Record<string, CalcValue>): KindEvaluation<MemberDesignView> {
  const truss = readTrussValue(resolved, inputs.truss);
  if (!truss) return failedEvaluation({ fieldErrors: [{ path: "truss", message: `${inputs.truss} is not a Truss or Combinations calc.` }] });
  const found = memberForceSource(truss, inputs, resolved);
  if (!found.ok) return failedEvaluation({ fieldErrors: [found.error] });
  const source = found.source;
  const { model } = truss;
  const force = model.units?.force ?? "kN";
  const length = model.units?.length ?? "m";
  const units = designUnits({ force, length }, inputs.material);
  const joints = new Map(model.joints.map((j) => [j.id, j]));
  const members = new Map(model.members.map((m) => [m.id, m]));

  const fieldErrors: CalcFieldError[] = [];
  const seen = new Set<string>();
  inputs.members.forEach((row, i) => {
    if (!members.has(row.member)) fieldErrors.push({ path: `members[${i}].member`, message: `Member ${row.member} is not in ${inputs.truss}.` });
    else if (seen.has(row.member)) fieldErrors.push({ path: `members[${i}].member`, message: `Member ${row.member} is listed twice.` });
    seen.add(row.member);
  });
  if (fieldErrors.length > 0) return failedEvaluation({ fieldErrors });

  const rows: MemberCheckRow[] = [];
  const steps: Step[] = [];
  for (let i = 0; i < inputs.members.length; i++) {
    const id = inputs.members[i].member;
    const m = members.get(id);
    const a = m && joints.get(m.start);
    const b = m && joints.get(m.end);
    const L = a && b ? Math.hypot(b.x - a.x, b.y - a.y) : 0;
    let best: { demand: { value: number; name: string }; result: CheckMemberResult } | null = null;
    try {
      for (const demand of demandsOf(source, id)) {
        const result = runMemberCheck(inputs, i, demand.value * units.forceFactor, L * units.lengthFactor, units);
        if (!best || result.utilization > best.result.utilization) best = { demand, result };
      }
    } catch (e) {
      return errorEvaluation(e, { fields: ["section", "K", "Fy", "Fu", "E", "An", "U", "method", "fy", "fu", "Anet", "curve", "gammaM0", "gammaM1", "gammaM2", "FcStar", "FtPrime", "EminPrime", "c"], prefix: `members[${i}]` });
    }
    if (!best) continue;
    const { demand, result } = best;
    rows.push({
      member: id,
      length: L,
      force: demand.value,
      combination: demand.name,
      mode: result.mode,
      demand: result.demand / units.forceFactor,
      capacity: result.capacity / units.forceFactor,
      utilization: result.utilization,
      pass: result.pass,
      governs: result.governs,
      slenderness: result.slenderness,
      warnings: result.warnings,
    });
    steps.push(
      {
        latex: `\\text{Member } ${texLabel(id)}:\\ L = ${texQty(L, length)},\\quad N = ${texQty(demand.value, force)}`,
        text: `Member ${id}, length ${L.toPrecision(4)} ${length}: governing force ${demand.value.toPrecision(4)} ${force} from ${demand.name}; checked in ${units.force}, ${units.length}, ${units.stress}.`,
      },
      ...result.steps,
    );
  }
  const governing = rows.reduce<MemberCheckRow | null>((g, r) => (!g || r.utilization > g.utilization ? r : g), null);
  const exports: Record<string, CalcValue> = { U_max: quantityValue(governing?.utilization ?? 0, "") };
  for (const r of rows) exports[exportName("U", r.member)] = quantityValue(r.utilization, "");
  const view: MemberDesignView = {
    truss: inputs.truss,
    material: inputs.material,
    source: source.kind === "envelope" ? `combinations ${source.label}` : `load case ${source.id}`,
    rows,
    governing: governing ? { member: governing.member, utilization: governing.utilization } : null,
    units: { force, length, design: { force: units.force, length: units.length, stress: units.stress } },
  };
  return computedEvaluation({ exports, steps, view });
}

/** The forces a member is checked for: one per case, or the envelope's tension and compression extremes. */
function demandsOf(source: MemberForceSource, member: string): { value: number; name: string }[] {
  if (source.kind === "case") return [{ value: source.forces[member] ?? 0, name: source.id }];
  const e = source.envelope[member];
  if (!e) return [{ value: 0, name: source.label }];
  const out: { value: number; name: string }[] = [];
  if (e.max.value > 0) out.push({ value: e.max.value, name: e.max.combination });
  if (e.min.value < 0) out.push({ value: e.min.value, name: e.min.combination });
  return out.length ? out : [{ value: e.max.value, name: e.max.combination }];
}
