import { bandNullVector } from "../sparse/band-null-vector";
import type { BandLdlt } from "../sparse/factor-band-ldlt";
import type { DofNumbering } from "./number-dofs";
import { toGlobal, type GlobalDisplacements } from "./to-global";

/** Modes worked out in full; past this, only the joint at each further zero pivot is named (it always moves). */
const MAX_MODES = 64;
/** A joint moves in a mode when its displacement exceeds this share of the mode's largest (round-off sits near 1e-12). */
const MOVING_SHARE = 1e-6;

/** One mechanism: how far each joint moves in it, in global x–y components (any scale). */
export type MechanismMode = GlobalDisplacements;

/**
 * The joints that can move, from the singular directions the zero pivots
 * reveal, in model order; and the first mode, for describing the mechanism.
 */
export function mechanismJoints(factor: BandLdlt, dofs: DofNumbering, jointCount: number): { moving: number[]; first: MechanismMode | null } {
  const moves = new Uint8Array(jointCount);
  let first: MechanismMode | null = null;
  factor.zeroPivots.forEach((row, k) => {
    moves[dofs.jointOf[row]] = 1;
    if (k >= MAX_MODES) return;
    const mode = toGlobal(bandNullVector(factor, row), dofs, jointCount);
    let peak = 0;
    for (let i = 0; i < jointCount; i++) peak = Math.max(peak, Math.hypot(mode.ux[i], mode.uy[i]));
    for (let i = 0; i < jointCount; i++) if (Math.hypot(mode.ux[i], mode.uy[i]) > MOVING_SHARE * peak) moves[i] = 1;
    if (!first) first = mode;
  });
  const moving: number[] = [];
  moves.forEach((flag, i) => flag && moving.push(i));
  return { moving, first };
}
