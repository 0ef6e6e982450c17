/** A deflection set against span / ratio. */
export type SpanCheck = {
  span: number;
  ratio: number;
  /** span / ratio, in the model's length unit. */
  allowable: number;
  /** True when the deflection's magnitude does not exceed the allowable. */
  pass: boolean;
  /** |δ| / allowable. */
  utilization: number;
};

/** Compares a deflection's magnitude with span / ratio (e.g. L/240, L/360). */
export function spanCheck(value: number, span: number, ratio: number): SpanCheck {
  const allowable = span / ratio;
  const utilization = Math.abs(value) / allowable;
  return { span, ratio, allowable, pass: Math.abs(value) <= allowable, utilization };
}
