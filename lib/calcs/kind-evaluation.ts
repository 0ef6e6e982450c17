import type { Step } from "../solve";
import type { CalcFieldError, CalcValue } from "./calc-types";

/**
 * What one kind's evaluator derives from its inputs and the values it reads.
 * `status` is "error" when the calc could not be computed (invalid inputs,
 * an unstable truss…); its exports are then not offered to other calcs.
 */
export type KindEvaluation<V = unknown> = {
  status: "ok" | "error";
  exports: Record<string, CalcValue>;
  steps: Step[];
  /** Kind-specific, JSON-serializable data for tables and diagrams; null when nothing could be derived. */
  view: V | null;
  fieldErrors: CalcFieldError[];
  messages: string[];
};

/** A calc that could not be computed, with what to show for it. */
export function failedEvaluation<V>(problems: { fieldErrors?: CalcFieldError[]; messages?: string[]; view?: V | null }): KindEvaluation<V> {
  return { status: "error", exports: {}, steps: [], view: problems.view ?? null, fieldErrors: problems.fieldErrors ?? [], messages: problems.messages ?? [] };
}

/** A calc that was computed. `messages` carry notes that do not stop it (a disagreement, a warning). */
export function computedEvaluation<V>(result: { exports: Record<string, CalcValue>; steps: Step[]; view: V; messages?: string[] }): KindEvaluation<V> {
  return { status: "ok", exports: result.exports, steps: result.steps, view: result.view, fieldErrors: [], messages: result.messages ?? [] };
}
