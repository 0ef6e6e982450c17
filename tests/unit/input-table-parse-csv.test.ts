import { describe, expect, it } from "vitest";
import { detectDelimiter, parseCsv } from "@/components/editor/input-table/parse-csv";

describe("parseCsv", () => {
  it("splits lines and fields, numbering records by their line", () => {
    const r = parseCsv("id,x,y\nA,0,0\n\nB,4,0\n");
    expect(r.records).toEqual([
      { line: 1, fields: ["id", "x", "y"] },
      { line: 2, fields: ["A", "0", "0"] },
      { line: 4, fields: ["B", "4", "0"] },
    ]);
    expect(r.problems).toEqual([]);
  });

  it("reads quoted fields with separators, doubled quotes and line breaks inside", () => {
    const r = parseCsv('id,note\nA,"pin, at ""grid"" 1"\nB,"two\nlines"\nC,x');
    expect(r.records[1].fields).toEqual(["A", 'pin, at "grid" 1']);
    expect(r.records[2]).toEqual({ line: 3, fields: ["B", "two\nlines"] });
    expect(r.records[3].line).toBe(5);
  });

  it("handles CRLF, a byte-order mark and a last line without a newline", () => {
    const r = parseCsv("\uFEFFid,x\r\nA,1\r\nB,2");
    expect(r.records.map((x) => x.fields)).toEqual([["id", "x"], ["A", "1"], ["B", "2"]]);
  });

  it("keeps a trailing empty field", () => {
    expect(parseCsv("a,b,\n").records[0].fields).toEqual(["a", "b", ""]);
  });

  it("keeps a quote inside an unquoted field as text (12\" from a spreadsheet)", () => {
    expect(parseCsv('A,12"\n').records[0].fields).toEqual(["A", '12"']);
  });

  it("reports a quote that is never closed and drops that record", () => {
    const r = parseCsv('id,x\nA,1\nB,"2\nC,3\n');
    expect(r.records.map((x) => x.fields[0])).toEqual(["id", "A"]);
    expect(r.problems).toEqual([{ line: 3, reason: "a quoted value opened on line 3 is never closed" }]);
  });

  it("detects semicolon and tab separators from the first line", () => {
    expect(detectDelimiter("id;x;y\nA;1,5;0")).toBe(";");
    expect(detectDelimiter("id\tx\ty")).toBe("\t");
    expect(detectDelimiter('"a;b",c')).toBe(",");
    expect(parseCsv("id;x\nA;1,5").records[1].fields).toEqual(["A", "1,5"]);
  });

  it("returns no records for an empty file", () => {
    expect(parseCsv("").records).toEqual([]);
    expect(parseCsv("\n\n").records).toEqual([]);
  });
});
