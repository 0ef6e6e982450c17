import type { Step } from "../types";

/** Published combination sets this module applies. */
export type LoadStandard = "ASCE7-16-LRFD" | "ASCE7-22-LRFD" | "ASCE7-16-ASD" | "EN1990-6.10" | "EN1990-6.10ab";

/** Load kinds of ASCE/SEI 7 §2.3 and §2.4: dead, live, roof live, snow, rain, wind. */
export type AsceKind = "D" | "L" | "Lr" | "S" | "R" | "W";

/** Action kinds of EN 1990: permanent G; variable Q (imposed), S (snow), W (wind). */
export type EnKind = "G" | "Q" | "S" | "W";

/**
 * One load case as a scalar effect (a member force, a reaction…). Variable
 * actions of the same kind are alternatives (wind from the left or from the
 * right, balanced or unbalanced snow) and enter a combination one at a time;
 * permanent actions of the same kind act together. Enter loads of one kind
 * that act together as one case.
 */
export type LoadAction = {
  id: string;
  /** `D L Lr S R W` for ASCE/SEI 7, `G Q S W` for EN 1990. */
  kind: string;
  /** Effect of the action at its characteristic (nominal) value, sign as computed. */
  value: number;
  /** EN 1990 only: ψ0 for this action, overriding the default of its kind (Table A1.1). */
  psi0?: number;
};

/** One combination: the factor applied to every action (0 where left out) and the combined effect. */
export type Combination = {
  /** Equation label and the factored terms, e.g. `(2) 1.2D + 1.6L + 0.5S`. */
  name: string;
  /** Edition, clause and equation the factors come from. */
  source: string;
  factors: Record<string, number>;
  value: number;
};

/** The governing combination for an extreme. */
export type Extreme = { value: number; name: string };

/** Options of `combineLoads`. */
export type CombineLoadsOptions = {
  standard: LoadStandard;
  actions: LoadAction[];
  /** Unit label of the values, for the steps (e.g. `kN`). */
  units?: string;
};

/** Every combination with relieving variable actions left out, and the extremes. */
export type CombineLoadsResult = {
  combinations: Combination[];
  max: Extreme;
  min: Extreme;
  steps: Step[];
};

/**
 * A combination before the envelope: for each action the factor it takes
 * where it adds to the effect being sought (`unfavourable`) and where it
 * relieves (`favourable`: 0 for variable actions, γG,inf or the table factor
 * for permanent ones).
 */
export type FactorRule = {
  /** Equation label, e.g. `2` or `6.10b`. */
  label: string;
  source: string;
  factors: Record<string, { unfavourable: number; favourable: number }>;
};
