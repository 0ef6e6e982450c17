"use client";

import { CsvImport } from "@/components/editor/input-table/csv-import";
import type { InputColumn, InputRow } from "@/components/editor/input-table/input-column";
import { InputTable } from "@/components/editor/input-table/input-table";

export type ImportableTableProps<Row extends InputRow> = {
  columns: readonly InputColumn<Row>[];
  rows: readonly Row[];
  onChange: (rows: Row[]) => void;
  errors: Readonly<Record<string, string>>;
  readOnly: boolean;
  /** Plural noun for the caption and buttons: "Joints". */
  noun: string;
  /** Singular, for the add button and row names: "joint". */
  one: string;
};

/** An input table that may also be filled from a CSV file; the file replaces the rows, which undo brings back. */
export function ImportableTable<Row extends InputRow>({ columns, rows, onChange, errors, readOnly, noun, one }: ImportableTableProps<Row>) {
  return (
    <div className="space-y-2">
      <InputTable
        columns={columns}
        rows={rows}
        onChange={onChange}
        errors={errors}
        readOnly={readOnly}
        caption={noun}
        addLabel={`Add ${one}`}
        rowName={(r, i) => `${one} ${typeof r.id === "string" && r.id ? r.id : i + 1}`}
      />
      {!readOnly && <CsvImport columns={columns} onImport={(imported) => onChange(imported)} label={`Import ${noun.toLowerCase()} from CSV (replaces the table)`} />}
    </div>
  );
}
