"use client";

import { useId, useState, type ChangeEvent } from "react";
import { describeImport } from "./describe-import";
import type { InputColumn, InputRow } from "./input-column";
import { importRows, type ImportResult } from "./import-rows";

export type CsvImportProps<Row extends InputRow> = {
  columns: readonly InputColumn<Row>[];
  /** Called with the imported rows (never when the whole file was refused); the caller replaces or appends. */
  onImport: (rows: Row[], result: ImportResult<Row>) => void;
  /** Button words, e.g. "Import joints (CSV)". */
  label?: string;
  newRow?: () => Row;
  disabled?: boolean;
};

/** A file picker for a CSV of rows, with a report of what was imported and which lines were skipped and why. */
export function CsvImport<Row extends InputRow>({ columns, onImport, label = "Import CSV", newRow, disabled = false }: CsvImportProps<Row>) {
  const inputId = useId();
  const [report, setReport] = useState<{ lines: string[]; failed: boolean } | null>(null);

  const onFile = async (e: ChangeEvent<HTMLInputElement>) => {
    const input = e.currentTarget;
    const file = input.files?.[0];
    // Cleared so that choosing the same file again (after fixing it) fires another change.
    input.value = "";
    if (!file) return;
    let text: string;
    try {
      text = await file.text();
    } catch (error) {
      setReport({ lines: [`Could not read ${file.name}: ${error instanceof Error ? error.message : String(error)}`], failed: true });
      return;
    }
    const result = importRows(columns, text, { newRow });
    setReport({ lines: describeImport(result), failed: result.error !== undefined });
    if (!result.error) onImport(result.rows, result);
  };

  return (
    <div className="text-xs">
      <label htmlFor={inputId} className={`pp-btn-quiet px-2 py-1 text-xs ${disabled ? "pointer-events-none opacity-50" : "cursor-pointer"}`}>
        {label}
      </label>
      <input id={inputId} type="file" accept=".csv,.txt,text/csv,text/plain" className="sr-only" disabled={disabled} onChange={onFile} />
      {report && (
        <ul role={report.failed ? "alert" : "status"} className={`mt-1.5 space-y-0.5 ${report.failed ? "text-compression" : "text-ink-soft"}`}>
          {report.lines.map((l, i) => (
            <li key={i}>{l}</li>
          ))}
        </ul>
      )}
    </div>
  );
}
