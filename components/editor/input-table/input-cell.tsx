"use client";

import { useState, type ClipboardEvent, type KeyboardEvent } from "react";
import { formatCell } from "./format-cell";
import { optionsOf, type CellValue, type InputColumn, type InputRow } from "./input-column";
import { caretPlace, type MoveFocusOptions } from "./move-focus";
import { parseCell } from "./parse-cell";

export type InputCellProps<Row extends InputRow> = {
  column: InputColumn<Row>;
  value: CellValue;
  /** `"row.col"`, so the table can find and focus the cell. */
  cellId: string;
  /** Accessible name, e.g. "x (m), joint J3". */
  label: string;
  /** An error from the model's validation, shown under the field. */
  error?: string;
  errorId: string;
  onCommit: (value: CellValue) => void;
  onNavigate: (e: KeyboardEvent<HTMLElement>, caret: MoveFocusOptions["caret"]) => void;
  onPaste: (e: ClipboardEvent<HTMLElement>) => void;
};

/**
 * One editable cell. A number cell keeps the text being typed ("-", "1.", "2e")
 * as a draft and commits each time it reads as a number, so the model and the
 * diagram follow the keystrokes while a half-typed value is never lost; text
 * that is not a number stays on screen, marked, rather than silently reverting.
 */
export function InputCell<Row extends InputRow>({ column, value, cellId, label, error, errorId, onCommit, onNavigate, onPaste }: InputCellProps<Row>) {
  // The draft belongs to the value it was typed against; a change from outside (paste, undo) discards it.
  const [draft, setDraft] = useState<{ text: string; base: CellValue } | null>(null);
  const live = draft !== null && draft.base === value ? draft : null;
  const parsed = live && column.kind === "number" ? parseCell(column, live.text) : null;
  const localError = parsed && !parsed.ok ? parsed.message : undefined;
  const message = localError ?? error;
  const invalid = message !== undefined;
  const common = {
    "data-cell": cellId,
    "aria-label": label,
    "aria-invalid": invalid || undefined,
    "aria-describedby": invalid ? errorId : undefined,
    onPaste,
  };

  const control =
    column.kind === "select" ? (
      <select {...common} className="pp-input px-1.5 py-1" value={value === undefined ? "" : String(value)} onChange={(e) => onCommit(e.target.value)} onKeyDown={(e) => onNavigate(e, "both")}>
        {value === undefined && <option value="">—</option>}
        {optionsOf(column).map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    ) : (
      <input
        {...common}
        type="text"
        inputMode={column.kind === "number" ? "decimal" : undefined}
        autoComplete="off"
        spellCheck={false}
        className={`pp-input px-1.5 py-1 ${column.kind === "number" ? "pp-num text-right" : ""}`}
        value={live ? live.text : formatCell(value)}
        onChange={(e) => {
          const text = e.target.value;
          if (column.kind === "text") {
            // Untrimmed while typing, or a space typed between words would vanish; trimmed on leaving the cell.
            onCommit(text);
            return;
          }
          const p = parseCell(column, text);
          const base = p.ok ? p.value : value;
          if (p.ok && p.value !== value) onCommit(p.value);
          setDraft({ text, base });
        }}
        onBlur={(e) => {
          if (column.kind === "text" && e.target.value !== e.target.value.trim()) onCommit(e.target.value.trim());
          if (!localError) setDraft(null);
        }}
        onKeyDown={(e) => onNavigate(e, caretPlace(e.currentTarget.selectionStart, e.currentTarget.selectionEnd, e.currentTarget.value.length))}
      />
    );

  return (
    <>
      {control}
      {invalid && (
        <span id={errorId} className="pp-error block">
          {message}
        </span>
      )}
    </>
  );
}
