import { describe, expect, it } from "vitest";
import { blankRow } from "@/components/editor/input-table/blank-row";
import { describePaste } from "@/components/editor/input-table/describe-paste";
import type { InputColumn } from "@/components/editor/input-table/input-column";
import { pasteBlock } from "@/components/editor/input-table/paste-block";

type JointRow = { id: string; x?: number; y?: number };
const columns: InputColumn<JointRow>[] = [
  { key: "id", label: "Label", kind: "text" },
  { key: "x", label: "x", unit: "m", kind: "number" },
  { key: "y", label: "y", unit: "m", kind: "number" },
];
const rows: JointRow[] = [{ id: "A", x: 0, y: 0 }, { id: "B", x: 4, y: 0 }];
const paste = (text: string, row: number, col: number) => pasteBlock({ rows, columns, at: { row, col }, text, newRow: () => blankRow(columns) });

describe("pasteBlock", () => {
  it("leaves a single value to the cell's own paste", () => {
    expect(paste("12.5", 0, 1)).toBeNull();
    expect(paste("12.5\r\n", 0, 1)).toBeNull();
  });

  it("fills the grid from the cell it lands in", () => {
    const r = paste("1\t2\n3\t4", 0, 1);
    expect(r?.rows).toEqual([{ id: "A", x: 1, y: 2 }, { id: "B", x: 3, y: 4 }]);
    expect(r?.problems).toEqual([]);
  });

  it("adds rows as needed", () => {
    const r = paste("C\t8\t0\nD\t12\t0\n", 2, 0);
    expect(r?.rows.map((x) => x.id)).toEqual(["A", "B", "C", "D"]);
    expect(r?.rows[3]).toEqual({ id: "D", x: 12, y: 0 });
  });

  it("leaves a cell as it was when its value does not fit, and reports it", () => {
    const r = paste("5\tabc\n6\t7", 0, 1);
    expect(r?.rows[0]).toEqual({ id: "A", x: 5, y: 0 });
    expect(r?.problems).toEqual([{ row: 0, key: "y", text: "abc", message: '"abc" is not a number' }]);
  });

  it("clears a target for a blank pasted cell, as a spreadsheet does", () => {
    expect(paste("\t9\n", 1, 1)?.rows[1]).toEqual({ id: "B", x: undefined, y: 9 });
  });

  it("counts values beyond the last column and leaves them out", () => {
    const r = paste("1\t2\t3\n4\t5\t", 0, 1);
    expect(r?.clipped).toBe(1);
    expect(r?.rows[0]).toEqual({ id: "A", x: 1, y: 2 });
  });

  it("drops a header line copied along with the block", () => {
    const r = paste("Label\tx (m)\ty (m)\nC\t8\t0", 0, 0);
    expect(r?.headerSkipped).toBe(true);
    expect(r?.rows[0]).toEqual({ id: "C", x: 8, y: 0 });
  });

  it("does not change the rows it was given", () => {
    paste("9\t9\n9\t9", 0, 1);
    expect(rows[0]).toEqual({ id: "A", x: 0, y: 0 });
  });
});

describe("describePaste", () => {
  it("names the cells that were not pasted and the values clipped", () => {
    const r = paste("a\tb\tc\n", 0, 1);
    if (!r) throw new Error("a block was expected");
    expect(describePaste(r, columns)).toBe('2 cells were not pasted (row 1 x: "a" is not a number; row 1 y: "b" is not a number). 1 value lies beyond the last column and was left out.');
  });

  it("says nothing when everything went in", () => {
    const r = paste("1\t2\n", 0, 1);
    if (!r) throw new Error("a block was expected");
    expect(describePaste(r, columns)).toBeNull();
  });
});
