import type { CalcFieldError } from "@/lib/calcs/calc-types";

const LINE_PATH = /^source:line(\d+)$/;

/** The problem on each line of the source (from 1), from the calc's `source:line<n>` field errors; the first message per line wins. */
export function formulaErrorLines(errors: readonly CalcFieldError[]): Map<number, string> {
  const out = new Map<number, string>();
  for (const e of errors) {
    const m = LINE_PATH.exec(e.path);
    if (m && !out.has(Number(m[1]))) out.set(Number(m[1]), e.message);
  }
  return out;
}

/** Whether a field error belongs to a line of the source (and so is shown on that line). */
export function isFormulaLinePath(path: string): boolean {
  return LINE_PATH.test(path);
}
