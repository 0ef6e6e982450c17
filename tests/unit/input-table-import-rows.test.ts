import { describe, expect, it } from "vitest";
import { describeImport } from "@/components/editor/input-table/describe-import";
import { importRows } from "@/components/editor/input-table/import-rows";
import type { InputColumn } from "@/components/editor/input-table/input-column";
import { matchHeader, sameUnit } from "@/components/editor/input-table/match-header";

type JointRow = { id: string; x?: number; y?: number };
const joints: InputColumn<JointRow>[] = [
  { key: "id", label: "Label", kind: "text", required: true, aliases: ["joint", "name"] },
  { key: "x", label: "x", unit: "m", kind: "number", required: true },
  { key: "y", label: "y", unit: "m", kind: "number", required: true },
];

type MemberRow = { id: string; start: string; end: string; A?: number };
const members: InputColumn<MemberRow>[] = [
  { key: "id", label: "Label", kind: "text", required: true },
  { key: "start", label: "Start", kind: "text", required: true, aliases: ["start joint", "from"] },
  { key: "end", label: "End", kind: "text", required: true, aliases: ["end joint", "to"] },
  { key: "A", label: "A", unit: "mm²", kind: "number" },
];

describe("matchHeader", () => {
  it("maps a header by key, label or alias, ignoring case and a unit", () => {
    expect(matchHeader(joints, "X (m)")).toEqual({ column: joints[1], unit: "m" });
    expect(matchHeader(joints, "LABEL")?.column.key).toBe("id");
    expect(matchHeader(joints, " Joint ")?.column.key).toBe("id");
    expect(matchHeader(members, "start_joint")?.column.key).toBe("start");
    expect(matchHeader(members, "A [mm^2]")).toEqual({ column: members[3], unit: "mm^2" });
    expect(matchHeader(joints, "z")).toBeUndefined();
  });

  it("treats spellings of one unit as the same", () => {
    expect(sameUnit("mm²", "MM2")).toBe(true);
    expect(sameUnit("kN", "kn")).toBe(true);
    expect(sameUnit("ft", "m")).toBe(false);
  });
});

describe("importRows", () => {
  it("imports joints with columns in any order", () => {
    const r = importRows(joints, "y (m),x (m),id\n0,0,L0\n0,4,L1\n3,4,U1\n");
    expect(r.rows).toEqual([{ id: "L0", x: 0, y: 0 }, { id: "L1", x: 4, y: 0 }, { id: "U1", x: 4, y: 3 }]);
    expect(r.skipped).toEqual([]);
    expect(r.error).toBeUndefined();
  });

  it("imports members, leaving optional columns the file lacks at the defaults", () => {
    const r = importRows(members, "label,from,to\nL0L1,L0,L1\n", { newRow: () => ({ id: "", start: "", end: "", A: 2500 }) });
    expect(r.rows).toEqual([{ id: "L0L1", start: "L0", end: "L1", A: 2500 }]);
    expect(r.missingColumns).toEqual(["A"]);
  });

  it("skips bad lines and says which and why", () => {
    const csv = "id,x,y\nA,0,0\nB,four,0\n,4,0\nC,1,2,3\nD,5,\nE,6,1\n";
    const r = importRows(joints, csv);
    expect(r.rows.map((x) => x.id)).toEqual(["A", "E"]);
    expect(r.skipped).toEqual([
      { line: 3, reason: 'x: "four" is not a number' },
      { line: 4, reason: "no value for Label" },
      { line: 5, reason: "4 values but the first line names 3 columns" },
      { line: 6, reason: "no value for y" },
    ]);
  });

  it("reads a semicolon file with decimal commas", () => {
    expect(importRows(joints, "id;x;y\nA;1,5;0,25\n").rows).toEqual([{ id: "A", x: 1.5, y: 0.25 }]);
  });

  it("refuses a file in other units rather than importing unconverted numbers", () => {
    const r = importRows(joints, "id,x (ft),y (ft)\nA,10,0\n");
    expect(r.rows).toEqual([]);
    expect(r.error).toBe("Column \"x (ft)\" is in ft but this table is in m. Convert the file, or change the package's units, and import again.");
  });

  it("refuses a file without a header line, or without a required column", () => {
    expect(importRows(joints, "A,0,0\nB,4,0\n").error).toMatch(/^The first line must name the columns, e\.g\. id, x, y\.$/);
    expect(importRows(joints, "id,x\nA,0\n").error).toBe("The file has no column for y.");
    expect(importRows(joints, "").error).toBe("The file is empty.");
  });

  it("lists header names it does not use and ignores blank lines", () => {
    const r = importRows(joints, "id,x,y,comment\nA,0,0,left support\n;;\n,,,\n");
    expect(r.ignoredHeaders).toEqual(["comment"]);
    expect(r.rows).toHaveLength(1);
  });

  it("reports an unclosed quote as a skipped line", () => {
    const r = importRows(joints, 'id,x,y\nA,0,0\n"B,4,0\n');
    expect(r.rows).toHaveLength(1);
    expect(r.skipped).toEqual([{ line: 3, reason: "a quoted value opened on line 3 is never closed" }]);
  });
});

describe("describeImport", () => {
  it("states the count, each skipped line and the unused columns", () => {
    const lines = describeImport(importRows(joints, "id,x,y,z\nA,0,0,1\nB,x,0,1\n"));
    expect(lines).toEqual(["Imported 1 row.", 'Line 3 skipped: x: "x" is not a number.', "Columns not used: z."]);
  });

  it("states the reason a whole file was refused", () => {
    expect(describeImport(importRows(joints, ""))).toEqual(["The file is empty."]);
  });
});
