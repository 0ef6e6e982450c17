import type { CalcFieldError } from "@/lib/calcs/calc-types";
import type { FormulaView as FormulaViewData } from "@/lib/calcs/formula/formula-view";
import { formulaErrorLines } from "./formula-error-lines";

/** One line of a Formula calc as the reader sees it, in source order. */
export type FormulaItem =
  | { kind: "note"; line: number; text: string }
  | { kind: "value"; line: number; name: string; latex: string; display: string; value?: number; unit?: string; note?: string }
  | { kind: "error"; line: number; name: string; source: string; message: string; note?: string };

/**
 * The rendered lines: notes, values and problems merged by line number. A
 * problem reported on a line the evaluated view does not hold (the view is
 * missing when the calc failed before its lines were read) still gets its
 * line, with the source text, so no error hides the others or itself.
 */
export function formulaLineItems(source: string, view: FormulaViewData | null, fieldErrors: readonly CalcFieldError[]): FormulaItem[] {
  const sourceLines = source.split(/\r?\n/);
  const textOf = (line: number) => (sourceLines[line - 1] ?? "").trim();
  const errors = formulaErrorLines(fieldErrors);
  const items: FormulaItem[] = [];
  const seen = new Set<number>();
  for (const n of view?.notes ?? []) items.push({ kind: "note", line: n.line, text: n.text });
  for (const l of view?.lines ?? []) {
    seen.add(l.line);
    const note = l.note === undefined ? {} : { note: l.note };
    const message = l.error ?? errors.get(l.line);
    if (message !== undefined || l.latex === undefined) {
      items.push({ kind: "error", line: l.line, name: l.name, source: textOf(l.line), message: message ?? "this line has no result", ...note });
    } else {
      items.push({ kind: "value", line: l.line, name: l.name, latex: l.latex, display: l.display ?? "", value: l.value, unit: l.unit, ...note });
    }
  }
  for (const [line, message] of errors) {
    if (seen.has(line)) continue;
    items.push({ kind: "error", line, name: nameOf(textOf(line)), source: textOf(line), message });
  }
  return items.sort((a, b) => a.line - b.line);
}

/** The name a source line assigns, for labelling a line the calc could not read: the text before `=`. */
function nameOf(text: string): string {
  const eq = text.indexOf("=");
  return eq > 0 ? text.slice(0, eq).trim() : "";
}

/** The calc's result line in words: how many values, and which lines have a problem. */
export function formulaSummary(items: readonly FormulaItem[]): string {
  const values = items.filter((i) => i.kind === "value").length;
  const bad = items.filter((i) => i.kind === "error").map((i) => i.line);
  const count = `${values} ${values === 1 ? "value" : "values"}`;
  if (bad.length === 0) return count;
  return `${count}; ${bad.length === 1 ? `line ${bad[0]} has a problem` : `lines ${listWords(bad)} have problems`}`;
}

function listWords(ns: number[]): string {
  return ns.length <= 1 ? ns.join("") : `${ns.slice(0, -1).join(", ")} and ${ns[ns.length - 1]}`;
}
