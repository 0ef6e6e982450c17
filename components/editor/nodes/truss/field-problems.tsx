import type { CalcFieldError } from "@/lib/calcs/calc-types";

export type FieldProblemsProps = { errors: readonly CalcFieldError[]; field: string };

/** The runtime's problems with one input field, shown under the control for it. */
export function FieldProblems({ errors, field }: FieldProblemsProps) {
  const mine = errors.filter((e) => e.path === field || e.path.startsWith(`${field}[`) || e.path.startsWith(`${field}.`));
  if (mine.length === 0) return null;
  return (
    <ul className="space-y-0.5" data-field={field}>
      {mine.map((e) => (
        <li key={`${e.path}:${e.message}`} className="pp-error">✕ {e.message}</li>
      ))}
    </ul>
  );
}
