/** A calc as the dependency graph sees it; the calc's own inputs stay with the caller. */
export type GraphCalc = {
  /** Stable identity (the document node id). */
  id: string;
  /** Short label unique in the package (T1, F3); references name it. No dots. */
  label: string;
  /** What the calc reads: a whole calc (`T1`) or one of its values (`T1.F_U1L2`). */
  references: string[];
  /** The value names the calc exports, when known in advance; lets the graph flag `T1.nope` before evaluation. */
  exports?: string[];
};

/** A calc that takes part in a cycle. */
export type CalcCycle = {
  /** The calc the cycle is reported on (its id). */
  calc: string;
  /** Labels around the cycle, starting and ending at this calc: ["F3", "F4", "F3"]. */
  path: string[];
  /** "F3 → F4 → F3" */
  message: string;
};

/** A reference to something that is not in the package. */
export type BrokenReference = {
  /** The calc that has the reference (its id). */
  calc: string;
  /** The reference as written: "T9" or "T9.F_U1L2". */
  reference: string;
  /** "T9 is not in this package", or "T1 has no value F_X". */
  message: string;
};

/** Output of {@link buildCalcGraph}. */
export type CalcGraph = {
  /** Every calc id, dependencies first; ties kept in package order. Calcs of one cycle sit together. */
  order: string[];
  cycles: CalcCycle[];
  broken: BrokenReference[];
  /** id → ids of the calcs it reads, in package order. */
  dependsOn: Record<string, string[]>;
  /** id → ids of the calcs that read it, in package order. */
  dependents: Record<string, string[]>;
  /** id → label, for messages. */
  labels: Record<string, string>;
};
