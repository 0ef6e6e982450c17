import type { CalcGraph, GraphCalc } from "./graph-types";

/** Something wrong with one calc, reported on that calc. */
export type CalcIssue = {
  /** broken: a reference to a missing calc or value; cycle: the calc reads itself through others;
   * blocked: a calc it reads has an error; failed: its own evaluation threw. */
  kind: "broken" | "cycle" | "blocked" | "failed";
  message: string;
  /** The reference as written, for `broken`. */
  reference?: string;
  /** Labels around the cycle, for `cycle`. */
  path?: string[];
};

/** The state of one calc after a recompute. */
export type CalcOutcome<V> = {
  id: string;
  label: string;
  /** ok: evaluated (now or before); error: its own problem; blocked: a calc it reads has one. */
  status: "ok" | "error" | "blocked";
  /** Its exported values; empty unless `ok`. */
  exports: Record<string, V>;
  issues: CalcIssue[];
};

/** Input of {@link recomputePackage}, generic over the calc shape `C` and the exported value type `V`. */
export type RecomputePackageOptions<C extends GraphCalc, V> = {
  calcs: readonly C[];
  /** Evaluates one calc from its inputs, keyed `Label.name` (`T1.F_U1L2`); returns its exports by name. */
  evaluate: (calc: C, inputs: Record<string, V>) => Record<string, V>;
  /** The last recompute of this package; unaffected calcs keep their outcome from it. */
  previous?: { results: Record<string, CalcOutcome<V>> };
  /** Ids of calcs whose inputs changed; without it every calc is evaluated. */
  changed?: Iterable<string>;
};

/** Output of {@link recomputePackage}. */
export type PackageRecompute<V> = {
  graph: CalcGraph;
  /** Ids evaluated (or re-checked) this time, in evaluation order. */
  recomputed: string[];
  /** Outcome of every calc of the package, by id. */
  results: Record<string, CalcOutcome<V>>;
};
