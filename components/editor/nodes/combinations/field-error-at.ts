import type { CalcFieldError } from "@/lib/calcs/calc-types";

/** The first message the calc reports on exactly `path`, or on a field inside it (`section` takes `section.t`). */
export function fieldErrorAt(errors: readonly CalcFieldError[], path: string): string | undefined {
  return errors.find((e) => e.path === path || e.path.startsWith(`${path}.`) || e.path.startsWith(`${path}[`))?.message;
}
