import { describe, expect, it } from "vitest";
import { blankRow } from "@/components/editor/input-table/blank-row";
import { cellKey } from "@/components/editor/input-table/cell-key";
import { errorsForTable } from "@/components/editor/input-table/errors-for-table";
import { formatCell } from "@/components/editor/input-table/format-cell";
import type { InputColumn } from "@/components/editor/input-table/input-column";
import { parseCell } from "@/components/editor/input-table/parse-cell";
import { setCell } from "@/components/editor/input-table/set-cell";

const num = { kind: "number", label: "x" } as const;
const support = { kind: "select", label: "Type", options: ["pin", { value: "roller", label: "Roller" }] } as const;

describe("parseCell", () => {
  it("reads plain, signed and exponent numbers", () => {
    expect(parseCell(num, " 12.5 ")).toEqual({ ok: true, value: 12.5 });
    expect(parseCell(num, "-3")).toEqual({ ok: true, value: -3 });
    expect(parseCell(num, "\u22124.2")).toEqual({ ok: true, value: -4.2 });
    expect(parseCell(num, "2e5")).toEqual({ ok: true, value: 200000 });
    expect(parseCell(num, ".5")).toEqual({ ok: true, value: 0.5 });
  });

  it("stores a blank number cell as no value", () => {
    expect(parseCell(num, "  ")).toEqual({ ok: true, value: undefined });
  });

  it("refuses a comma unless the source uses a decimal comma, since 1,500 is ambiguous", () => {
    expect(parseCell(num, "1,500").ok).toBe(false);
    expect(parseCell(num, "1,5", { decimalComma: true })).toEqual({ ok: true, value: 1.5 });
    expect(parseCell(num, "1.000,5", { decimalComma: true }).ok).toBe(false);
  });

  it("refuses text and half-typed numbers with a message", () => {
    expect(parseCell(num, "abc")).toEqual({ ok: false, message: '"abc" is not a number' });
    expect(parseCell(num, "-").ok).toBe(false);
    expect(parseCell(num, "1e999").ok).toBe(false);
  });

  it("matches select options by value or label, ignoring case", () => {
    expect(parseCell(support, "PIN")).toEqual({ ok: true, value: "pin" });
    expect(parseCell(support, "roller")).toEqual({ ok: true, value: "roller" });
    expect(parseCell(support, "fixed")).toEqual({ ok: false, message: '"fixed" is not one of pin, roller' });
  });

  it("trims text", () => {
    expect(parseCell({ kind: "text", label: "Label" }, " J1 ")).toEqual({ ok: true, value: "J1" });
  });
});

describe("formatCell", () => {
  it("hides binary noise but keeps typed digits", () => {
    expect(formatCell(2.9999999999999996)).toBe("3");
    expect(formatCell(0.1 + 0.2)).toBe("0.3");
    expect(formatCell(12.345678)).toBe("12.345678");
    expect(formatCell(undefined)).toBe("");
    expect(formatCell("J1")).toBe("J1");
  });
});

type JointRow = { id: string; x?: number; y?: number; type?: string };
const columns: InputColumn<JointRow>[] = [
  { key: "id", label: "Label", kind: "text" },
  { key: "x", label: "x", unit: "m", kind: "number" },
  { key: "type", label: "Type", kind: "select", options: ["pin", "roller"] },
];

describe("blankRow, setCell and cellKey", () => {
  it("makes an empty row with the first option chosen", () => {
    expect(blankRow(columns)).toEqual({ id: "", x: undefined, type: "pin" });
  });

  it("changes one cell and keeps the other rows as they were", () => {
    const rows: JointRow[] = [{ id: "A", x: 0 }, { id: "B", x: 4 }];
    const next = setCell(rows, 1, "x", 5);
    expect(next[1]).toEqual({ id: "B", x: 5 });
    expect(next[0]).toBe(rows[0]);
    expect(rows[1].x).toBe(4);
  });

  it("keys cells by row index and column key", () => {
    expect(cellKey(3, "x")).toBe("3.x");
  });
});

describe("errorsForTable", () => {
  it("keys the engineering core's field errors by cell for one table", () => {
    const errors = errorsForTable(
      [
        { path: "members[3].end", message: "Joint J9 does not exist" },
        { path: "joints[0].x", message: "x must be a number" },
        { path: "members[3].end", message: "second message" },
        { path: "members", message: "No members" },
      ],
      "members",
    );
    expect(errors).toEqual({ "3.end": "Joint J9 does not exist" });
  });

  it("reaches nested tables such as a load case's loads", () => {
    expect(errorsForTable([{ path: "loadCases[1].loads[2].fy", message: "not finite" }], "loadCases[1].loads")).toEqual({ "2.fy": "not finite" });
  });
});
