"use client";

import { useEffect, useId, useRef, useState, type ClipboardEvent, type KeyboardEvent } from "react";
import { blankRow } from "./blank-row";
import { cellKey } from "./cell-key";
import { describePaste } from "./describe-paste";
import { formatCell } from "./format-cell";
import { InputCell } from "./input-cell";
import { optionsOf, type InputColumn, type InputRow } from "./input-column";
import { moveFocus, type CellPosition, type MoveFocusOptions } from "./move-focus";
import { pasteBlock } from "./paste-block";
import { setCell } from "./set-cell";

export type InputTableProps<Row extends InputRow> = {
  columns: readonly InputColumn<Row>[];
  rows: readonly Row[];
  onChange: (rows: Row[]) => void;
  /** Messages keyed by `cellKey(rowIndex, key)`, e.g. `"2.x"`; see `errorsForTable`. */
  errors?: Readonly<Record<string, string>>;
  readOnly?: boolean;
  /** The table's name, e.g. "Joints"; read out by screen readers and shown as the caption. */
  caption?: string;
  /** A new row for Enter on the last row, the add button and pasting past the end; default `blankRow`. */
  newRow?: (rows: readonly Row[]) => Row;
  /** How a row is named in labels, e.g. (r) => `joint ${r.id}`; default "row 3". */
  rowName?: (row: Row, index: number) => string;
  /** Words on the add button, e.g. "Add joint". */
  addLabel?: string;
  className?: string;
};

/**
 * An editable grid for a calc's inputs: arrows, Enter and Tab move between
 * cells (Enter on the last row adds one), a block pasted from a spreadsheet
 * fills the grid from the cell it lands in, and model errors show on the
 * field that is wrong. The logic lives in pure functions; this is the wiring.
 */
export function InputTable<Row extends InputRow>({ columns, rows, onChange, errors = {}, readOnly = false, caption, newRow, rowName, addLabel = "Add row", className }: InputTableProps<Row>) {
  const id = useId();
  const tableRef = useRef<HTMLTableElement>(null);
  const addRef = useRef<HTMLButtonElement>(null);
  const [pendingFocus, setPendingFocus] = useState<CellPosition | null>(null);
  const [pasteNote, setPasteNote] = useState<string | null>(null);
  const cols = columns.length + (readOnly ? 0 : 1);
  const make = () => (newRow ? newRow(rows) : blankRow(columns));
  const nameOf = (i: number) => (rowName ? rowName(rows[i], i) : `row ${i + 1}`);

  const focusCell = (p: CellPosition): boolean => {
    const el = tableRef.current?.querySelector<HTMLElement>(`[data-cell="${p.row}.${p.col}"]`);
    if (!el) return false;
    el.focus();
    // Landing on a cell selects its text, as in a spreadsheet: typing replaces it, and arrows move straight on.
    if (el instanceof HTMLInputElement) el.select();
    return true;
  };

  // A new row appears only after the parent re-renders (perhaps later, through the editor);
  // so this runs after every render and keeps trying until the cell exists.
  useEffect(() => {
    if (pendingFocus && focusCell(pendingFocus)) setPendingFocus(null);
  });

  const navigate = (at: CellPosition, isButton: boolean) => (e: KeyboardEvent<HTMLElement>, caret: MoveFocusOptions["caret"]) => {
    const move = moveFocus({ at, key: e.key, shift: e.shiftKey, modifier: e.ctrlKey || e.altKey || e.metaKey, rows: rows.length, cols, caret, isButton, canAddRow: !readOnly });
    if (move.kind === "none") return;
    e.preventDefault();
    if (move.kind === "add-row") {
      onChange([...rows, make()]);
      setPendingFocus(move.to);
    } else focusCell(move.to);
  };

  const paste = (at: CellPosition) => (e: ClipboardEvent<HTMLElement>) => {
    const result = pasteBlock({ rows, columns, at, text: e.clipboardData.getData("text/plain"), newRow: make });
    if (!result) return;
    e.preventDefault();
    onChange(result.rows);
    setPasteNote(describePaste(result, columns));
  };

  const remove = (index: number, col: number) => {
    onChange(rows.filter((_, i) => i !== index));
    if (rows.length === 1) addRef.current?.focus();
    else setPendingFocus({ row: Math.min(index, rows.length - 2), col });
  };

  return (
    <div className={className}>
      <table ref={tableRef} className="pp-table" aria-label={caption}>
        {caption && <caption className="sr-only">{caption}</caption>}
        <colgroup>
          {columns.map((c) => (
            <col key={c.key} style={c.width !== undefined ? { width: c.width } : undefined} />
          ))}
          {!readOnly && <col style={{ width: "2.5rem" }} />}
        </colgroup>
        <thead>
          <tr>
            {columns.map((c) => (
              <th key={c.key} scope="col" className={c.kind === "number" ? "text-right" : undefined}>
                {c.label}
                {/* Units keep their case: kN is not KN, and mm is not Mm. */}
                {c.unit && <span className="normal-case tracking-normal text-ink-faint">{` (${c.unit})`}</span>}
              </th>
            ))}
            {!readOnly && <th scope="col" className="sr-only">Remove</th>}
          </tr>
        </thead>
        <tbody>
          {rows.length === 0 && (
            <tr>
              <td colSpan={cols} className="py-3 text-center text-ink-faint">
                No rows yet
              </td>
            </tr>
          )}
          {rows.map((row, r) => (
            // Keyed by position: a row's label is itself editable, so there is no stable id to key by.
            <tr key={r}>
              {columns.map((c, ci) =>
                readOnly ? (
                  <td key={c.key} className={c.kind === "number" ? "pp-num text-right" : undefined}>
                    {c.kind === "select" ? (optionsOf(c).find((o) => o.value === row[c.key])?.label ?? formatCell(row[c.key])) : formatCell(row[c.key])}
                    {errors[cellKey(r, c.key)] && <span className="pp-error block font-sans">{errors[cellKey(r, c.key)]}</span>}
                  </td>
                ) : (
                  <td key={c.key} className="px-1 py-1">
                    <InputCell
                      column={c}
                      value={row[c.key]}
                      cellId={`${r}.${ci}`}
                      label={`${c.label}${c.unit ? ` (${c.unit})` : ""}, ${nameOf(r)}`}
                      error={errors[cellKey(r, c.key)]}
                      errorId={`${id}-e${r}-${ci}`}
                      onCommit={(v) => onChange(setCell(rows, r, c.key, v))}
                      onNavigate={navigate({ row: r, col: ci }, false)}
                      onPaste={paste({ row: r, col: ci })}
                    />
                  </td>
                ),
              )}
              {!readOnly && (
                <td className="px-1 py-1 text-center">
                  <button
                    type="button"
                    data-cell={`${r}.${columns.length}`}
                    className="rounded-sm px-1.5 py-0.5 text-ink-faint hover:bg-compression-light hover:text-compression"
                    aria-label={`Remove ${nameOf(r)}`}
                    onClick={() => remove(r, columns.length)}
                    onKeyDown={(e) => navigate({ row: r, col: columns.length }, true)(e, "both")}
                  >
                    <span aria-hidden="true">×</span>
                  </button>
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
      {!readOnly && (
        <div className="mt-2 flex flex-wrap items-center gap-3">
          <button ref={addRef} type="button" className="pp-btn-quiet px-2 py-1 text-xs" onClick={() => { onChange([...rows, make()]); setPendingFocus({ row: rows.length, col: 0 }); }}>
            + {addLabel}
          </button>
          <span role="status" className="text-xs text-caution">
            {pasteNote}
          </span>
        </div>
      )}
    </div>
  );
}

