import { texNum, texQty, texUnit } from "../latex";
import type { FormulaAst } from "./formula-ast";
import type { Quantity } from "./formula-types";
import { texName } from "./tex-name";

/** Symbols as written, or every variable replaced by its shown value and unit. */
export type TexMode = { kind: "symbols" } | { kind: "numbers"; shown: (name: string) => Quantity | undefined };

// Where a rendered piece sits, which decides whether it needs parentheses.
type Place = "top" | "sum-left" | "sum-right" | "product" | "power-base" | "negate";
// What a rendered piece is: a single value (negative or with a unit) or an operation.
type Shape = "atom" | "negative" | "with-unit" | "sum" | "product" | "fraction" | "power" | "negation";
type Piece = { tex: string; shape: Shape };

/** The expression as LaTeX that KaTeX renders; fractions for `/`, user parentheses kept. */
export function astToTex(ast: FormulaAst, mode: TexMode): string {
  return render(ast, mode, "top");
}

function render(ast: FormulaAst, mode: TexMode, place: Place): string {
  const piece = build(ast, mode);
  return needsParens(piece.shape, place) ? `\\left(${piece.tex}\\right)` : piece.tex;
}

function needsParens(shape: Shape, place: Place): boolean {
  switch (place) {
    case "top":
    case "sum-left":
      return false;
    case "sum-right":
      return shape === "negative" || shape === "sum" || shape === "negation";
    case "product":
    case "negate":
      return shape === "negative" || shape === "sum" || shape === "negation";
    case "power-base":
      return shape !== "atom";
  }
}

function build(ast: FormulaAst, mode: TexMode): Piece {
  switch (ast.kind) {
    case "number":
      return { tex: texLiteral(ast.value), shape: "atom" };
    case "quantity":
      return { tex: `${texLiteral(ast.value)}\\,\\mathrm{${texUnit(ast.unit)}}`, shape: ast.value < 0 ? "negative" : "with-unit" };
    case "variable": {
      const q = mode.kind === "numbers" ? mode.shown(ast.name) : undefined;
      if (!q) return { tex: texName(ast.name), shape: "atom" };
      const tex = texQty(q.value, q.unit);
      return { tex, shape: tex.startsWith("-") ? "negative" : q.unit ? "with-unit" : "atom" };
    }
    case "pi":
      return { tex: "\\pi", shape: "atom" };
    case "group":
      return { tex: `\\left(${render(ast.content, mode, "top")}\\right)`, shape: "atom" };
    case "negate":
      return { tex: `-${render(ast.operand, mode, "negate")}`, shape: "negation" };
    case "call":
      return { tex: call(ast.fn, ast.args.map((a) => render(a, mode, "top"))), shape: "atom" };
    case "binary":
      return binary(ast, mode);
  }
}

function binary(ast: FormulaAst & { kind: "binary" }, mode: TexMode): Piece {
  const { op, left, right } = ast;
  if (op === "+" || op === "-") {
    return { tex: `${render(left, mode, "sum-left")} ${op} ${render(right, mode, "sum-right")}`, shape: "sum" };
  }
  if (op === "/") return { tex: `\\frac{${render(ungroup(left), mode, "top")}}{${render(ungroup(right), mode, "top")}}`, shape: "fraction" };
  if (op === "^") return { tex: `${render(left, mode, "power-base")}^{${render(ungroup(right), mode, "top")}}`, shape: "power" };
  const a = render(left, mode, "product");
  const b = render(right, mode, "product");
  // With symbols, `w L^2` reads better juxtaposed; a number on the right, or numbers substituted, need a dot.
  const dot = mode.kind === "numbers" || startsWithNumber(right);
  return { tex: dot ? `${a} \\cdot ${b}` : `${a}\\,${b}`, shape: "product" };
}

function call(fn: string, args: string[]): string {
  switch (fn) {
    case "sqrt":
      return `\\sqrt{${args[0]}}`;
    case "abs":
      return `\\left|${args[0]}\\right|`;
    default:
      return `\\${fn}\\left(${args.join(",\\ ")}\\right)`;
  }
}

function startsWithNumber(ast: FormulaAst): boolean {
  if (ast.kind === "number" || ast.kind === "quantity" || ast.kind === "negate") return true;
  if (ast.kind === "binary") return startsWithNumber(ast.left);
  return false;
}

/** Parentheses the fraction bar or the raised exponent already make clear. */
function ungroup(ast: FormulaAst): FormulaAst {
  return ast.kind === "group" ? ungroup(ast.content) : ast;
}

/** A number as the author wrote it (no rounding), in LaTeX. */
function texLiteral(value: number): string {
  const s = String(value);
  return /e/i.test(s) ? texNum(value, 15) : s;
}
