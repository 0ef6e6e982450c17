import { solveBandLdlt } from "../sparse/solve-band-ldlt";
import type { BandLdlt } from "../sparse/factor-band-ldlt";
import { SolveError } from "../errors";
import type { CaseResult, Displacement, Reaction, TrussModel } from "../types";
import type { MemberCoefficients } from "./assemble-stiffness";
import { cleanRoundOff } from "./clean-round-off";
import type { TrussIndex } from "./index-truss";
import type { JointLoadTotals } from "./joint-loads";
import { toGlobal } from "./to-global";
import type { MemberGeometry } from "./member-geometry";
import type { DofNumbering } from "./number-dofs";

/** Everything one back-substitution needs; the factor is shared by all load cases. */
export type CaseSolveContext = {
  /** The validated model. */
  model: TrussModel;
  index: TrussIndex;
  geometry: MemberGeometry;
  dofs: DofNumbering;
  coefficients: MemberCoefficients;
  /** LDLᵀ factor of the stiffness built from `axial`. */
  factor: BandLdlt;
  /** Axial stiffness k of each member used in the factor. */
  axial: Float64Array;
  /** False when the stiffness is a unit stand-in, whose displacements mean nothing. */
  withDisplacements: boolean;
};

/**
 * Solves one load case with the shared factor, then recovers member forces
 * N = k·elongation (tension positive) and reactions from joint equilibrium,
 * R = −P − Σ(member forces on the joint). Round-off is cleaned against the
 * case's largest force and largest displacement.
 */
export function recoverCaseResult(ctx: CaseSolveContext, loads: JointLoadTotals): CaseResult {
  const { model, index, geometry, dofs } = ctx;
  const jCount = model.joints.length;
  const rhs = new Float64Array(dofs.n);
  for (let k = 0; k < jCount; k++) {
    if (dofs.dof1[k] >= 0) rhs[dofs.dof1[k]] = loads.fx[k] * dofs.e1x[k] + loads.fy[k] * dofs.e1y[k];
    if (dofs.dof2[k] >= 0) rhs[dofs.dof2[k]] = loads.fx[k] * dofs.e2x[k] + loads.fy[k] * dofs.e2y[k];
  }
  const x = solveBandLdlt(ctx.factor, rhs);
  const { eq, v } = ctx.coefficients;
  const force = new Float64Array(ctx.axial.length);
  const rx = new Float64Array(jCount);
  const ry = new Float64Array(jCount);
  let scale = 0;
  for (let k = 0; k < jCount; k++) {
    rx[k] = -loads.fx[k];
    ry[k] = -loads.fy[k];
    scale = Math.max(scale, Math.abs(loads.fx[k]), Math.abs(loads.fy[k]));
  }
  for (let e = 0; e < force.length; e++) {
    let elongation = 0;
    for (let p = 4 * e; p < 4 * e + 4; p++) if (eq[p] >= 0) elongation += v[p] * x[eq[p]];
    const N = ctx.axial[e] * elongation;
    force[e] = N;
    scale = Math.max(scale, Math.abs(N));
    // Tension pulls the start joint towards the end and the end towards the start.
    rx[index.start[e]] -= N * geometry.cx[e];
    ry[index.start[e]] -= N * geometry.cy[e];
    rx[index.end[e]] += N * geometry.cx[e];
    ry[index.end[e]] += N * geometry.cy[e];
  }
  const reactions: Record<string, Reaction> = {};
  for (const support of model.supports) {
    const k = index.jointIndex.get(support.joint) ?? -1;
    let [Rx, Ry] = [rx[k], ry[k]];
    if (support.type === "roller") {
      // Only the component along the reaction line is real; the rest is round-off.
      const along = Rx * dofs.e2x[k] + Ry * dofs.e2y[k];
      Rx = along * dofs.e2x[k];
      Ry = along * dofs.e2y[k];
    }
    scale = Math.max(scale, Math.abs(Rx), Math.abs(Ry));
    reactions[support.joint] = { rx: Rx, ry: Ry };
  }
  const result: CaseResult = { reactions, forces: {} };
  for (const r of Object.values(reactions)) {
    r.rx = finite(cleanRoundOff(r.rx, scale));
    r.ry = finite(cleanRoundOff(r.ry, scale));
  }
  for (let e = 0; e < force.length; e++) result.forces[model.members[e].id] = finite(cleanRoundOff(force[e], scale));
  if (ctx.withDisplacements) result.displacements = displacements(x, ctx);
  return result;
}

function displacements(x: Float64Array, ctx: CaseSolveContext): Record<string, Displacement> {
  const { ux, uy } = toGlobal(x, ctx.dofs, ctx.model.joints.length);
  let scale = 0;
  for (let k = 0; k < ux.length; k++) scale = Math.max(scale, Math.abs(ux[k]), Math.abs(uy[k]));
  const out: Record<string, Displacement> = {};
  const { joints } = ctx.model;
  for (let k = 0; k < joints.length; k++) out[joints[k].id] = { ux: finite(cleanRoundOff(ux[k], scale)), uy: finite(cleanRoundOff(uy[k], scale)) };
  return out;
}

function finite(value: number): number {
  if (Number.isFinite(value)) return value === 0 ? 0 : value;
  throw new SolveError("UNSTABLE", "The stiffness equations did not give finite results; check for members far stiffer or far softer than the rest, or loads out of all proportion.");
}
