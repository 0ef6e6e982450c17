import { isReservedName } from "./reserved-names";

/** One source line taken apart; problems are worded without the line number. */
export type SplitLine =
  | { kind: "blank" }
  | { kind: "note"; text: string }
  | { kind: "formula"; name: string; expression: string; target?: string; note?: string }
  /** `named`: the name itself is valid, so later lines reading it learn that its line failed. */
  | { kind: "malformed"; name: string; named: boolean; message: string; note?: string };

const NAME = /^[A-Za-z][A-Za-z0-9_]*$/;

/** Splits `name = expression -> unit # note` into its parts. */
export function splitFormulaLine(text: string): SplitLine {
  const hash = text.indexOf("#");
  const body = (hash >= 0 ? text.slice(0, hash) : text).trim();
  const comment = hash >= 0 ? text.slice(hash + 1).trim() : "";
  const note = comment === "" ? undefined : comment;
  if (body === "") return note === undefined ? { kind: "blank" } : { kind: "note", text: note };

  const eq = body.indexOf("=");
  if (eq < 0) return { kind: "malformed", name: "", named: false, message: 'expected "name = expression"', note };
  const name = body.slice(0, eq).trim();
  const nameProblem = checkName(name);
  if (nameProblem) return { kind: "malformed", name, named: false, message: nameProblem, note };

  let expression = body.slice(eq + 1);
  let target: string | undefined;
  const arrow = expression.indexOf("->");
  if (arrow >= 0) {
    target = expression.slice(arrow + 2).trim();
    expression = expression.slice(0, arrow);
  }
  expression = expression.trim();
  if (expression === "") return { kind: "malformed", name, named: true, message: "nothing after =", note };
  return { kind: "formula", name, expression, target, note };
}

function checkName(name: string): string | undefined {
  if (name === "") return "a name is needed before =";
  if (name.includes(".")) return `${name} cannot be assigned: a dotted name refers to a value of another calc`;
  if (!NAME.test(name)) return `${name} is not a valid name (letters, digits and _, starting with a letter)`;
  if (isReservedName(name)) return `${name} is reserved (a function or a word of the syntax); choose another name`;
  return undefined;
}
