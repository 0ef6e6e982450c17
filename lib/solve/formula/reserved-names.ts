/** Functions a formula may call, with how many arguments each takes. */
export const FORMULA_FUNCTIONS = {
  sqrt: { min: 1, max: 1 },
  abs: { min: 1, max: 1 },
  sin: { min: 1, max: 1 },
  cos: { min: 1, max: 1 },
  tan: { min: 1, max: 1 },
  min: { min: 1, max: Number.POSITIVE_INFINITY },
  max: { min: 1, max: Number.POSITIVE_INFINITY },
} as const;

/** A function name of the formula syntax. */
export type FormulaFunction = keyof typeof FORMULA_FUNCTIONS;

/** True when `name` is one of the functions a formula may call. */
export function isFormulaFunction(name: string): name is FormulaFunction {
  return Object.hasOwn(FORMULA_FUNCTIONS, name);
}

// Words the expression reader gives a meaning of its own; a variable of that name could never be read back.
const RESERVED = new Set([
  ...Object.keys(FORMULA_FUNCTIONS),
  "pi", "to", "in", "mod", "and", "or", "not", "xor", "true", "false", "null", "undefined", "NaN", "Infinity",
]);

/** True for names a line may not assign (functions, `pi`, words of the expression reader). */
export function isReservedName(name: string): boolean {
  return RESERVED.has(name);
}
