/** The extreme of one quantity over every combination, with the combination that gives it. */
export type Extreme = { value: number; combination: string };

/** What the Combinations calc shows. */
export type CombinationsView = {
  truss: string;
  standard: string;
  /** The truss's cases with the kind each was combined as. */
  cases: { id: string; kind: string }[];
  /** Every combination applied, with its factors by case id. */
  combinations: { name: string; source: string; factors: Record<string, number> }[];
  /** Governing combination per member force (tension positive). */
  members: { member: string; max: Extreme; min: Extreme }[];
  /** Governing combination per support reaction component. */
  reactions: { joint: string; component: "x" | "y"; max: Extreme; min: Extreme }[];
  units: { force: string };
};
