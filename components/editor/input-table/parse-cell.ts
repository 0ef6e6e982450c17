import { optionsOf, type CellValue, type InputColumn } from "./input-column";

export type ParsedCell = { ok: true; value: CellValue } | { ok: false; message: string };

export type ParseCellOptions = {
  /** The text comes from a semicolon-separated file, where a comma is the decimal mark. */
  decimalComma?: boolean;
};

/** A plain decimal, optionally signed, with an optional exponent. No thousands separators. */
const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

/**
 * Text typed or pasted into a cell, as the value to store. A blank number cell
 * is `undefined`. A comma is refused as a decimal mark unless the source is
 * known to use it: "1,500" could be 1.5 or 1500, and a silent factor of a
 * thousand in a load is the worst kind of error.
 */
export function parseCell(column: Pick<InputColumn, "kind" | "options" | "label">, text: string, options: ParseCellOptions = {}): ParsedCell {
  const t = text.trim();
  if (column.kind === "text") return { ok: true, value: t };
  if (column.kind === "select") {
    if (t === "") return { ok: true, value: undefined };
    const lower = t.toLowerCase();
    const hit = optionsOf(column).find((o) => o.value.toLowerCase() === lower || o.label.toLowerCase() === lower);
    if (hit) return { ok: true, value: hit.value };
    return { ok: false, message: `"${t}" is not one of ${optionsOf(column).map((o) => o.value).join(", ")}` };
  }
  if (t === "") return { ok: true, value: undefined };
  // A typographic minus (from a document or a spreadsheet's formatting) means minus.
  let s = t.replace(/[\u2212\u2012\u2013]/g, "-");
  if (options.decimalComma) {
    if (s.includes(".") && s.includes(",")) return { ok: false, message: `"${t}" mixes a point and a comma` };
    s = s.replace(",", ".");
  } else if (s.includes(",")) {
    return { ok: false, message: `"${t}": use a point for decimals, and no thousands separators` };
  }
  if (!NUMBER.test(s)) return { ok: false, message: `"${t}" is not a number` };
  const value = Number(s);
  if (!Number.isFinite(value)) return { ok: false, message: `"${t}" is too large` };
  return { ok: true, value };
}
