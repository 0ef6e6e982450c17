"use client";

import { useId } from "react";

export type GeneratorFieldProps = { label: string; unit?: string; value: string; onChange: (text: string) => void; readOnly: boolean; error?: string };

/** One number of the shape generator, with its unit in the label and its problem under it. */
export function GeneratorField({ label, unit, value, onChange, readOnly, error }: GeneratorFieldProps) {
  const errorId = useId();
  return (
    <label className="block">
      <span className="pp-label">
        {label}
        {unit && <span className="normal-case tracking-normal text-ink-faint">{` (${unit})`}</span>}
      </span>
      <input
        className="pp-input pp-num text-right"
        inputMode="decimal"
        autoComplete="off"
        value={value}
        readOnly={readOnly}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? errorId : undefined}
        onChange={(e) => onChange(e.target.value)}
      />
      {error && <span id={errorId} className="pp-error block">{error}</span>}
    </label>
  );
}
