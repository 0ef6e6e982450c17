import type { DeflectionInputs } from "@/lib/calcs/deflection/deflection-inputs";

/**
 * The form's state: the inputs, with the ratio optional because a blank
 * ratio (while the author types another) is stored as absent and read by the
 * calc as its default, L/360.
 */
export type DeflectionForm = Omit<DeflectionInputs, "limitRatio"> & { limitRatio?: number };

/** The ratio a blank limit means, as the inputs' schema defaults it. */
export const DEFAULT_LIMIT_RATIO = 360;

/** The inputs as stored, read without trusting them, so the form opens on whatever a document holds. */
export function readDeflectionInputs(raw: unknown): DeflectionForm {
  const o = typeof raw === "object" && raw !== null ? (raw as Record<string, unknown>) : {};
  return {
    truss: typeof o.truss === "string" ? o.truss : "",
    loadCase: typeof o.loadCase === "string" ? o.loadCase : "",
    joint: typeof o.joint === "string" ? o.joint : "",
    direction: o.direction === "x" ? "x" : "y",
    ...(typeof o.limitRatio === "number" ? { limitRatio: o.limitRatio } : {}),
    ...(typeof o.span === "number" ? { span: o.span } : {}),
  };
}

/** The form with one optional number set or, when blank, left out. */
export function withOptional(form: DeflectionForm, key: "span" | "limitRatio", value: number | undefined): DeflectionForm {
  const next: DeflectionForm = { ...form };
  if (value === undefined) delete next[key];
  else next[key] = value;
  return next;
}
