import katex from "katex";
import { expect } from "vitest";
import { SolveError } from "@/lib/solve/errors";

/** Every step typesets with KaTeX in its strictest mode. */
export function rendersAll(steps: { latex: string }[]): void {
  for (const s of steps) expect(() => katex.renderToString(s.latex, { throwOnError: true, strict: "error" }), s.latex).not.toThrow();
}

/** The `path` of the INVALID SolveError that `fn` throws; fails the test if it throws anything else or nothing. */
export function invalidPath(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(SolveError);
    expect((e as SolveError).code).toBe("INVALID");
    return (e as SolveError).path;
  }
  throw new Error("expected a SolveError");
}

/** The SolveError that `fn` throws (any code); rethrows anything else, fails if nothing is thrown. */
export function thrown(fn: () => unknown): SolveError {
  try {
    fn();
  } catch (e) {
    if (e instanceof SolveError) return e;
    throw e;
  }
  throw new Error("expected a SolveError");
}
