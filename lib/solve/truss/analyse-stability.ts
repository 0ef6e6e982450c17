import { SolveError } from "../errors";
import { factorBandLdlt, type BandLdlt } from "../sparse/factor-band-ldlt";
import type { TrussModel } from "../types";
import { assembleStiffness, memberCoefficients, type MemberCoefficients } from "./assemble-stiffness";
import { describeMechanism } from "./describe-mechanism";
import { indexTruss, type TrussIndex } from "./index-truss";
import { mechanismJoints } from "./mechanism-joints";
import { memberGeometry, type MemberGeometry } from "./member-geometry";
import { numberDofs, type DofNumbering } from "./number-dofs";

/** Member and reaction counts and the determinacy of a stable truss. */
export type TrussCount = {
  /** Members. */
  m: number;
  /** Reaction components: 2 per pin, 1 per roller. */
  r: number;
  /** Joints. */
  j: number;
  /** "determinate" when m + r = 2j, "indeterminate" when m + r > 2j (an unstable truss throws instead). */
  classification: "determinate" | "indeterminate";
};

/** What the stability check learned, kept so that the solver does not repeat it. */
export type StabilityAnalysis = {
  counts: TrussCount;
  /** Joint positions of every member end. */
  index: TrussIndex;
  /** Member lengths and directions. */
  geometry: MemberGeometry;
  /** Equation numbers, in reverse Cuthill–McKee order. */
  dofs: DofNumbering;
  /** Elongation coefficients, shared by every stiffness assembled for this model. */
  coefficients: MemberCoefficients;
  /** Factor of the stiffness with unit axial stiffness in every member. */
  unitFactor: BandLdlt;
};

/**
 * Relative pivot below which the geometry counts as a mechanism. Unit axial
 * stiffness makes the test depend on geometry alone; a true mechanism leaves
 * pivots near 1e-15, while a bar tilted by 1e-5 rad from a mechanism still
 * gives about 1e-10.
 */
export const MECHANISM_PIVOT_TOLERANCE = 1e-10;

/**
 * Counts m, r, j and proves stability numerically: the stiffness matrix of
 * the free components, with unit axial stiffness, is factored; any zero pivot
 * is a way the truss can move without straining a member. Throws
 * `SolveError("UNSTABLE", …, { joints })` naming the joints that move.
 * The model must already be valid (see `validateTruss`).
 */
export function analyseStability(model: TrussModel): StabilityAnalysis {
  const m = model.members.length;
  const j = model.joints.length;
  const r = model.supports.reduce((sum, s) => sum + (s.type === "pin" ? 2 : 1), 0);
  const index = indexTruss(model);
  const geometry = memberGeometry(model, index);
  const dofs = numberDofs(model, index);
  const coefficients = memberCoefficients(index, geometry, dofs);
  const K = assembleStiffness(coefficients, dofs, new Float64Array(m).fill(1));
  const unitFactor = factorBandLdlt(K, { pivotTolerance: MECHANISM_PIVOT_TOLERANCE });
  const tally = `m + r = ${m} + ${r} = ${m + r}`;
  if (unitFactor.zeroPivots.length > 0 || m + r < 2 * j) {
    const { moving, first } = mechanismJoints(unitFactor, dofs, j);
    const joints = (moving.length ? moving : freeJoints(dofs, j)).map((k) => model.joints[k].id);
    const why = m + r < 2 * j ? `${tally} is less than 2j = ${2 * j}, so there are too few members and reactions` : `${tally} against 2j = ${2 * j}, but ${describeMechanism(model, first)}`;
    throw new SolveError("UNSTABLE", `The truss is unstable: ${why}. Joints that can move: ${listJoints(joints)}.`, { joints });
  }
  const classification = m + r === 2 * j ? "determinate" : "indeterminate";
  return { counts: { m, r, j, classification }, index, geometry, dofs, coefficients, unitFactor };
}

function freeJoints(dofs: DofNumbering, j: number): number[] {
  const out: number[] = [];
  for (let k = 0; k < j; k++) if (dofs.dof1[k] >= 0 || dofs.dof2[k] >= 0) out.push(k);
  return out;
}

function listJoints(ids: string[]): string {
  const shown = ids.slice(0, 12).join(", ");
  return ids.length > 12 ? `${shown} and ${ids.length - 12} more` : shown;
}
