"use client";

import { useId } from "react";

export type CaseSelectProps = {
  cases: readonly { id: string; label: string }[];
  value: string;
  onChange: (id: string) => void;
  /** Words before the select: "Load case". */
  label?: string;
  disabled?: boolean;
};

/** Picks one load case or combination by id. */
export function CaseSelect({ cases, value, onChange, label = "Load case", disabled = false }: CaseSelectProps) {
  const id = useId();
  return (
    <span className="inline-flex items-center gap-2 text-sm">
      <label htmlFor={id} className="pp-label mb-0">{label}</label>
      <select id={id} className="pp-input w-auto py-0.5" value={value} disabled={disabled || cases.length === 0} onChange={(e) => onChange(e.target.value)}>
        {cases.length === 0 && <option value="">none yet</option>}
        {cases.map((c) => (
          <option key={c.id} value={c.id}>{c.label}</option>
        ))}
      </select>
    </span>
  );
}
