"use client";

import { useId, type ReactNode } from "react";
import type { SelectOption } from "@/components/editor/input-table/input-column";

export type SelectFieldProps = {
  label: string;
  value: string;
  options: readonly SelectOption[];
  onChange: (value: string) => void;
  readOnly: boolean;
  /** A problem the calc reports on this field, shown under it. */
  error?: string;
  /** A short line under the field saying what the choice means. */
  hint?: ReactNode;
  className?: string;
  /** The label is a symbol ("c", "fy"), not words: keep its case. */
  plainCase?: boolean;
};

/**
 * A labelled choice. Read-only it shows the chosen option's words in the same
 * place, so a checker sees the calc laid out exactly as its author does.
 */
export function SelectField({ label, value, options, onChange, readOnly, error, hint, className, plainCase = false }: SelectFieldProps) {
  const id = useId();
  const shown = options.find((o) => o.value === value)?.label ?? value;
  const labelClass = plainCase ? "pp-label normal-case tracking-normal" : "pp-label";
  return (
    <div className={className}>
      {readOnly ? (
        <>
          <span className={labelClass}>{label}</span>
          <span className="block py-1.5 text-sm">{shown || "—"}</span>
        </>
      ) : (
        <>
          <label htmlFor={id} className={labelClass}>
            {label}
          </label>
          <select
            id={id}
            className="pp-input py-1"
            value={value}
            aria-invalid={error ? true : undefined}
            aria-describedby={error ? `${id}-error` : undefined}
            onChange={(e) => onChange(e.target.value)}
          >
            {!options.some((o) => o.value === value) && <option value={value}>{value || "—"}</option>}
            {options.map((o) => (
              <option key={o.value} value={o.value}>
                {o.label}
              </option>
            ))}
          </select>
        </>
      )}
      {error && (
        <span id={`${id}-error`} className="pp-error block">
          ✕ {error}
        </span>
      )}
      {hint && !error && <span className="mt-1 block text-xs text-ink-faint">{hint}</span>}
    </div>
  );
}
