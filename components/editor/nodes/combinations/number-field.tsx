"use client";

import { useId, type ReactNode } from "react";
import { formatCell } from "@/components/editor/input-table/format-cell";
import { InputCell } from "@/components/editor/input-table/input-cell";
import type { CellValue, InputColumn } from "@/components/editor/input-table/input-column";

export type NumberFieldProps = {
  label: ReactNode;
  /** Spoken name, e.g. "yield strength fy"; the visible label may be a symbol. */
  name: string;
  /** Whose value it is, e.g. "member U1U2": read after the unit, "fy (MPa), member U1U2". */
  owner?: string;
  unit?: string;
  value: number | undefined;
  onChange: (value: number | undefined) => void;
  readOnly: boolean;
  error?: string;
  /** What a blank field means, e.g. "1.0" or "the truss's extent". */
  blankMeans?: string;
  className?: string;
};

const NUMBER: InputColumn = { key: "value", label: "value", kind: "number" };
const ignore = () => undefined;

/**
 * One labelled number, typed live: the cell of the input tables on its own,
 * so a half-typed value ("1.", "-") is kept as typed and a value that is not
 * a number is marked where it was typed.
 */
export function NumberField({ label, name, owner, unit, value, onChange, readOnly, error, blankMeans, className }: NumberFieldProps) {
  const id = useId();
  const accessible = `${name}${unit ? ` (${unit})` : ""}${owner ? `, ${owner}` : ""}`;
  return (
    <div className={className}>
      <span className="pp-label normal-case tracking-normal">
        {label}
        {unit && <span className="text-ink-faint">{` (${unit})`}</span>}
      </span>
      {readOnly ? (
        <span className="pp-num block py-1 text-sm" aria-label={accessible}>
          {value === undefined ? <span className="font-sans text-ink-faint">{blankMeans ? `default ${blankMeans}` : "—"}</span> : formatCell(value)}
          {error && <span className="pp-error block font-sans">✕ {error}</span>}
        </span>
      ) : (
        <InputCell
          column={NUMBER}
          value={value}
          cellId={id}
          label={accessible}
          error={error}
          errorId={`${id}-error`}
          onCommit={(v: CellValue) => onChange(typeof v === "number" ? v : undefined)}
          onNavigate={ignore}
          onPaste={ignore}
        />
      )}
      {blankMeans && !readOnly && !error && <span className="mt-0.5 block text-[11px] leading-tight text-ink-faint">blank: {blankMeans}</span>}
    </div>
  );
}
