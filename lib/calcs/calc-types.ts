import type { Step, TrussModel, TrussSolution } from "../solve";

/**
 * The calcs of a package as the editor, the server and the export see them.
 * A calc node in the document stores only `id`, `label` and `inputs`; all the
 * rest is derived by `evaluateCalcs` (lib/calcs), in the browser while typing
 * and on the server on every save, issue and export.
 */
export const calcKinds = ["truss", "sectionCut", "joint", "formula", "combinations", "memberDesign", "deflection"] as const;
export type CalcKind = (typeof calcKinds)[number];

/** Label prefixes: T1, S2, J3, F4, C5, M6, D7. */
export const calcLabelPrefix: Record<CalcKind, string> = {
  truss: "T",
  sectionCut: "S",
  joint: "J",
  formula: "F",
  combinations: "C",
  memberDesign: "M",
  deflection: "D",
};

/** One calc as stored in the document (the attributes of its node). `inputs` is validated per kind. */
export type CalcNode = { id: string; kind: CalcKind; label: string; inputs: unknown };

/** The governing combination of one member force, at each extreme. */
export type ForceEnvelope = {
  /** Largest (most tensile) force and the combination that gives it. */
  max: { value: number; combination: string };
  /** Smallest (most compressive) force and the combination that gives it. */
  min: { value: number; combination: string };
};

/** A solved truss as other calcs read it (`T1.model`, or `C1.model` with the combinations added). */
export type TrussValue = {
  type: "truss";
  /** The model in consistent units (A in length², E in force/length²), load cases and any combinations as cases. */
  model: TrussModel;
  /** Results of every case in `model.loadCases`, combinations included. */
  solution: TrussSolution;
  /** Ids of the load cases as the author entered them. */
  cases: string[];
  /** Names of the combinations added as cases (empty for a Truss calc's own value). */
  combinations: string[];
  /** Label of the Truss calc the model comes from. */
  source?: string;
  /** Kind of each entered load case (D, L, G, Q, … or a custom kind), by case id. */
  caseKinds?: Record<string, string>;
  /** Governing combination per member force, by member id (a Combinations calc's value only). */
  envelope?: Record<string, ForceEnvelope>;
};

/** A value one calc exports for others: a number with its unit, or a whole solved truss. */
export type CalcValue = { type: "quantity"; value: number; unit: string } | TrussValue;

/** A problem on one input field of a calc, for highlighting it in the editor. */
export type CalcFieldError = { path: string; message: string };

/** Everything derived for one calc. */
export type CalcResult = {
  id: string;
  label: string;
  kind: CalcKind;
  status: "ok" | "error" | "blocked";
  /** Field-level problems (invalid inputs), each naming its field: `members[3].end`. */
  fieldErrors: CalcFieldError[];
  /** Calc-level problems: unstable truss, broken reference, cycle, depends on a calc with an error. */
  messages: string[];
  /** Typeset working, in order. */
  steps: Step[];
  /** Named values other calcs may read as `Label.name`. */
  exports: Record<string, CalcValue>;
  /** Kind-specific data for tables and diagrams (e.g. member forces per case); JSON-serializable. */
  view: unknown;
};

export type PackageEvaluation = {
  /** By calc id, in document order. */
  results: Record<string, CalcResult>;
  /** Ids recomputed this time (all on a full evaluation). */
  recomputed: string[];
};
