import type { MathNode, OperatorNode, OperatorNodeFn, OperatorNodeOp } from "mathjs";
import { isConstantNode, isFunctionNode, isOperatorNode, isParenthesisNode, isSymbolNode } from "mathjs";
import type { FormulaAst } from "./formula-ast";
import { FormulaProblem } from "./formula-problem";
import { normalizeUnit } from "./normalize-unit";
import { FORMULA_FUNCTIONS, isFormulaFunction } from "./reserved-names";
import { unitInfo, isUnitName } from "./unit-info";

/** The names a line can see: bound variables, and names whose lines failed. Safe names (`T1$F`). */
export type NameContext = {
  isVariable(name: string): boolean;
  /** The line that failed to define `name`, if it did. */
  failedLine(name: string): number | undefined;
};

/**
 * Classifies every name of a mathjs tree. A name bound by an earlier line or
 * the scope is always a variable, even when it is also a unit (L, A, N, m…).
 * Any other name is a unit only where it is written as one: right after a
 * number (`3 m`, `12 kN/m`, `2000 mm^2`). Anything else is an unknown name, so
 * a forgotten variable never turns silently into amperes or litres.
 */
export function toFormulaAst(node: MathNode, names: NameContext): FormulaAst {
  const literal = quantityLiteral(node, names);
  if (literal) {
    const found = unitInfo(literal.unit);
    if (!found.ok) throw new FormulaProblem(found.message);
    return literal;
  }
  if (isConstantNode(node)) {
    if (typeof node.value !== "number") throw new FormulaProblem(`${String(node.value)} is not a number`);
    if (!Number.isFinite(node.value)) throw new FormulaProblem("a number is too large");
    return { kind: "number", value: node.value };
  }
  if (isSymbolNode(node)) return symbol(node.name, names);
  if (isParenthesisNode(node)) return { kind: "group", content: toFormulaAst(node.content, names) };
  if (isOperatorNode(node)) return operator(node, names);
  if (isFunctionNode(node)) {
    const name = node.fn.name;
    if (!isFormulaFunction(name)) throw new FormulaProblem(`unknown function ${shown(name)}`);
    const { min, max } = FORMULA_FUNCTIONS[name];
    if (node.args.length < min || node.args.length > max) {
      throw new FormulaProblem(`${name} takes ${min === max ? `${min} value` : `at least ${min} value`}, not ${node.args.length}`);
    }
    return { kind: "call", fn: name, args: node.args.map((a) => toFormulaAst(a, names)) };
  }
  throw new FormulaProblem(`"${shown(node.toString())}" is not part of the formula syntax`);
}

const BINARY = { add: "+", subtract: "-", multiply: "*", divide: "/", pow: "^" } as const;

function operator(node: OperatorNode<OperatorNodeOp, OperatorNodeFn>, names: NameContext): FormulaAst {
  const { fn, args } = node;
  if (fn === "unaryMinus") return { kind: "negate", operand: toFormulaAst(args[0], names) };
  if (fn === "unaryPlus") return toFormulaAst(args[0], names);
  if (Object.hasOwn(BINARY, fn) && args.length === 2) {
    return {
      kind: "binary",
      op: BINARY[fn as keyof typeof BINARY],
      left: toFormulaAst(args[0], names),
      right: toFormulaAst(args[1], names),
    };
  }
  throw new FormulaProblem(`the operator "${node.op}" is not part of the formula syntax`);
}

function symbol(name: string, names: NameContext): FormulaAst {
  if (names.isVariable(name)) return { kind: "variable", name };
  const failed = names.failedLine(name);
  if (failed !== undefined) throw new FormulaProblem(`depends on line ${failed} which has an error`, failed);
  if (name === "pi") return { kind: "pi" };
  if (isFormulaFunction(name)) throw new FormulaProblem(`${name} is a function: write ${name}(…)`);
  if (isUnitName(name)) throw new FormulaProblem(`unknown name ${name} (a unit is written after a number, e.g. 1 ${name})`);
  throw new FormulaProblem(`unknown name ${shown(name)}`);
}

/** `12 kN/m`, `5 kN m`, `-3 m`: a number followed by units, read as one value. */
function quantityLiteral(node: MathNode, names: NameContext): (FormulaAst & { kind: "quantity" }) | undefined {
  if (!isOperatorNode(node) || node.args.length !== 2) return undefined;
  const [left, right] = node.args;
  if (node.fn !== "multiply" && node.fn !== "divide") return undefined;
  const unit = unitExpression(right, names);
  if (unit === undefined) return undefined;
  if (node.fn === "multiply" && node.implicit) {
    const value = numberLiteral(left);
    if (value !== undefined) return { kind: "quantity", value, unit: normalizeUnit(unit) };
  }
  const inner = quantityLiteral(left, names);
  if (!inner) return undefined;
  const joined = node.fn === "multiply" ? `${inner.unit}*${unit}` : `${inner.unit}/${wrapCompound(unit)}`;
  return { kind: "quantity", value: inner.value, unit: normalizeUnit(joined) };
}

function numberLiteral(node: MathNode): number | undefined {
  if (isConstantNode(node)) return typeof node.value === "number" && Number.isFinite(node.value) ? node.value : undefined;
  if (isOperatorNode(node) && node.args.length === 1 && (node.fn === "unaryMinus" || node.fn === "unaryPlus")) {
    const inner = isConstantNode(node.args[0]) ? numberLiteral(node.args[0]) : undefined;
    return inner === undefined ? undefined : node.fn === "unaryMinus" ? -inner : inner;
  }
  return undefined;
}

/** The unit text of a subtree made only of unbound unit names, powers and products/quotients of them. */
function unitExpression(node: MathNode, names: NameContext): string | undefined {
  if (isSymbolNode(node)) {
    const n = node.name;
    const free = !names.isVariable(n) && names.failedLine(n) === undefined && n !== "pi" && !isFormulaFunction(n);
    return free && isUnitName(n) ? n : undefined;
  }
  if (isParenthesisNode(node)) {
    const inner = unitExpression(node.content, names);
    return inner === undefined ? undefined : wrapCompound(inner);
  }
  if (!isOperatorNode(node) || node.args.length !== 2) return undefined;
  const [a, b] = node.args;
  const base = unitExpression(a, names);
  if (base === undefined) return undefined;
  if (node.fn === "pow") {
    const p = numberLiteral(b);
    return p === undefined ? undefined : `${wrapCompound(base)}^${p}`;
  }
  const other = unitExpression(b, names);
  if (other === undefined) return undefined;
  if (node.fn === "multiply") return `${base}*${other}`;
  if (node.fn === "divide") return `${base}/${wrapCompound(other)}`;
  return undefined;
}

/** Parenthesizes a product or quotient of units, unless one pair of parentheses already encloses it all. */
function wrapCompound(unit: string): string {
  if (!/[*/]/.test(unit)) return unit;
  let depth = 0;
  for (let i = 0; i < unit.length; i++) {
    if (unit[i] === "(") depth++;
    if (unit[i] === ")") depth--;
    if (depth === 0 && i < unit.length - 1) return `(${unit})`;
  }
  return unit;
}

/** Names in messages as the author wrote them (`T1$F` → `T1.F`). */
function shown(text: string): string {
  return text.replaceAll("$", ".");
}
