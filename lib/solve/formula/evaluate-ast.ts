import { describeMeasure } from "./describe-measure";
import type { FormulaAst } from "./formula-ast";
import { formulaMath } from "./formula-math";
import { FormulaProblem } from "./formula-problem";
import type { UnitSystem } from "./formula-types";
import { isDimensionless, type Measure, sameDims } from "./measure";
import { fromSafeName } from "./safe-name";
import type { FormulaFunction } from "./reserved-names";
import { unitInfo } from "./unit-info";

/** What evaluation reads: bound variables (by safe name) and the system used to word messages. */
export type EvaluationContext = { values: ReadonlyMap<string, Measure>; system: UnitSystem };

const PLAIN: readonly number[] = Object.freeze(formulaMath.Unit.BASE_DIMENSIONS.map(() => 0));
const ANGLE = formulaMath.Unit.BASE_DIMENSIONS.indexOf("ANGLE");

/** Evaluates a classified expression; throws {@link FormulaProblem} on unit mismatches and non-real results. */
export function evaluateAst(ast: FormulaAst, ctx: EvaluationContext): Measure {
  switch (ast.kind) {
    case "number":
      return { si: ast.value, dims: PLAIN };
    case "quantity": {
      const found = unitInfo(ast.unit);
      if (!found.ok) throw new FormulaProblem(found.message);
      return real({ si: ast.value * found.info.factor, dims: found.info.dims, hint: ast.unit });
    }
    case "variable": {
      const bound = ctx.values.get(ast.name);
      if (!bound) throw new FormulaProblem(`unknown name ${fromSafeName(ast.name)}`);
      return bound;
    }
    case "pi":
      return { si: Math.PI, dims: PLAIN };
    case "group":
      return evaluateAst(ast.content, ctx);
    case "negate": {
      const x = evaluateAst(ast.operand, ctx);
      return { ...x, si: -x.si };
    }
    case "binary":
      return binary(ast.op, evaluateAst(ast.left, ctx), evaluateAst(ast.right, ctx), ctx.system);
    case "call":
      return call(ast.fn, ast.args.map((a) => evaluateAst(a, ctx)), ctx.system);
  }
}

function binary(op: "+" | "-" | "*" | "/" | "^", a: Measure, b: Measure, system: UnitSystem): Measure {
  const say = (m: Measure) => describeMeasure(m, system);
  switch (op) {
    case "+":
    case "-":
      if (!sameDims(a.dims, b.dims)) {
        throw new FormulaProblem(op === "+" ? `cannot add ${say(a)} and ${say(b)}` : `cannot subtract ${say(b)} from ${say(a)}`);
      }
      return real({ si: op === "+" ? a.si + b.si : a.si - b.si, dims: a.dims, hint: a.hint ?? b.hint });
    case "*":
      return real({ si: a.si * b.si, dims: a.dims.map((x, i) => x + b.dims[i]), hint: scaledHint(a, b) ?? scaledHint(b, a) });
    case "/":
      if (b.si === 0) throw new FormulaProblem("division by zero");
      return real({ si: a.si / b.si, dims: a.dims.map((x, i) => x - b.dims[i]), hint: isDimensionless(b.dims) ? a.hint : undefined });
    case "^": {
      if (!isDimensionless(b.dims)) throw new FormulaProblem(`an exponent must be a plain number, not ${say(b)}`);
      const si = a.si ** b.si;
      if (Number.isNaN(si)) throw new FormulaProblem(`a negative value to the power ${b.si} has no real result`);
      return real({ si, dims: a.dims.map((x) => x * b.si), hint: b.si === 1 ? a.hint : undefined });
    }
  }
}

/** A plain factor keeps the other side's unit: 2 × 3 m stays in m. */
function scaledHint(plain: Measure, other: Measure): string | undefined {
  return isDimensionless(plain.dims) && !isDimensionless(other.dims) ? other.hint : undefined;
}

function call(fn: FormulaFunction, args: Measure[], system: UnitSystem): Measure {
  const say = (m: Measure) => describeMeasure(m, system);
  const [x] = args;
  switch (fn) {
    case "sqrt":
      if (x.si < 0) throw new FormulaProblem(`sqrt of a negative value`);
      return real({ si: Math.sqrt(x.si), dims: x.dims.map((d) => d / 2), hint: isDimensionless(x.dims) ? x.hint : undefined });
    case "abs":
      return { ...x, si: Math.abs(x.si) };
    case "sin":
    case "cos":
    case "tan": {
      const isAngle = x.dims.every((d, i) => (i === ANGLE ? d === 0 || Math.abs(d - 1) < 1e-9 : Math.abs(d) < 1e-9));
      if (!isAngle) throw new FormulaProblem(`${fn} needs an angle (e.g. 30 deg) or a plain number in radians, not ${say(x)}`);
      return real({ si: Math[fn](x.si), dims: PLAIN });
    }
    case "min":
    case "max": {
      const odd = args.find((m) => !sameDims(m.dims, x.dims));
      if (odd) throw new FormulaProblem(`${fn} needs values of one kind, not ${say(x)} and ${say(odd)}`);
      const pick = fn === "min" ? (p: Measure, q: Measure) => (q.si < p.si ? q : p) : (p: Measure, q: Measure) => (q.si > p.si ? q : p);
      return args.reduce(pick);
    }
  }
}

/** Every intermediate value must stay a real, finite number. */
function real(m: Measure): Measure {
  if (Number.isNaN(m.si)) throw new FormulaProblem("the result is not a real number");
  if (!Number.isFinite(m.si)) throw new FormulaProblem("the result is too large to represent");
  return m;
}
