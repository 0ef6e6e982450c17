import type { CalcFieldError } from "@/lib/calcs/calc-types";

export type FieldErrorListProps = {
  errors: readonly CalcFieldError[];
  /** Whether a field of the form already shows this error; those are left out here. */
  shownOnField: (path: string) => boolean;
};

/**
 * The problems no field of the form can show (a path the form has no control
 * for): listed with their path, so no problem the calc reports is ever hidden.
 */
export function FieldErrorList({ errors, shownOnField }: FieldErrorListProps) {
  const rest = errors.filter((e) => !shownOnField(e.path));
  if (rest.length === 0) return null;
  return (
    <ul className="space-y-0.5 rounded-sm border border-compression bg-compression-light px-3 py-1.5 text-xs text-compression" role="alert">
      {rest.map((e) => (
        <li key={`${e.path}:${e.message}`}>
          ✕ {e.path ? <span className="pp-num">{e.path}</span> : "Inputs"}: {e.message}
        </li>
      ))}
    </ul>
  );
}
