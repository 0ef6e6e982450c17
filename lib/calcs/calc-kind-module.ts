import type { z } from "zod";
import type { CalcFieldError, CalcValue } from "./calc-types";
import { inputFieldErrors } from "./input-field-errors";
import type { KindEvaluation } from "./kind-evaluation";

/** What an evaluator knows about the calc it evaluates besides its inputs. */
export type EvaluateContext = {
  /** The calc's own label, e.g. "T1", recorded on values it exports. */
  label: string;
};

/** One calc kind: its inputs, where a new calc starts, what it reads, and how it is computed. */
export type CalcKindModule<I> = {
  /** zod schema of the inputs stored in the node's attrs; fills defaults. */
  inputs: z.ZodType<I>;
  /** Inputs a newly inserted calc starts from (valid for the schema). */
  defaults: () => unknown;
  /**
   * What the calc reads: `Label.value` references. `labels` are the labels in
   * the package, for inputs that may name either a calc or something else.
   */
  references: (inputs: I, labels: ReadonlySet<string>) => string[];
  /** Derives everything from the inputs and the referenced values, keyed `Label.value`. Never throws for bad input. */
  evaluate: (inputs: I, resolved: Record<string, CalcValue>, context: EvaluateContext) => KindEvaluation;
};

/** A calc's inputs after parsing: either ready to evaluate, or the field errors that stop it. */
export type PreparedInputs =
  | {
      ok: true;
      references: (labels: ReadonlySet<string>) => string[];
      evaluate: (resolved: Record<string, CalcValue>, context: EvaluateContext) => KindEvaluation;
    }
  | { ok: false; fieldErrors: CalcFieldError[] };

/** A calc kind with its input type hidden, so the kinds can sit in one table. */
export type CalcKindEntry = {
  defaults: () => unknown;
  prepare: (raw: unknown) => PreparedInputs;
};

/** Wraps a kind module so that parsing happens once and the typed inputs stay inside closures. */
export function defineCalcKind<I>(kind: CalcKindModule<I>): CalcKindEntry {
  return {
    defaults: kind.defaults,
    prepare(raw) {
      const parsed = kind.inputs.safeParse(raw);
      if (!parsed.success) {
        // Parse again keeping the offending values, so a missing field reads differently from a wrong one; only on failure.
        const again = kind.inputs.safeParse(raw, { reportInput: true });
        return { ok: false, fieldErrors: inputFieldErrors(again.error ?? parsed.error) };
      }
      const inputs = parsed.data;
      return {
        ok: true,
        references: (labels) => kind.references(inputs, labels),
        evaluate: (resolved, context) => kind.evaluate(inputs, resolved, context),
      };
    },
  };
}
