import { AlignmentType, BorderStyle, Paragraph, ShadingType, Table, TableCell, TableRow, TextRun, WidthType, type ParagraphChild } from "docx";
import type { ReportTable } from "../report-model";
import { HEADER_FILL, RULE } from "./docx-fonts";

export type CellAlign = "left" | "right" | "center";

const ALIGN = { left: AlignmentType.LEFT, right: AlignmentType.RIGHT, center: AlignmentType.CENTER } as const;
const line = { style: BorderStyle.SINGLE, size: 4, color: RULE };
const BORDERS = { top: line, bottom: line, left: line, right: line, insideHorizontal: line, insideVertical: line };

export type GridOptions = {
  header: ParagraphChild[][] | null;
  rows: ParagraphChild[][][];
  align?: CellAlign[];
  /** Column widths as fractions of the text width; equal when absent. */
  widths?: number[];
  widthTwips: number;
};

/**
 * A table over the full text width. The header row is marked as a header
 * (`w:tblHeader`) so Word repeats it on every page the table runs onto, and
 * no row splits across a page break.
 */
export function docxGrid(options: GridOptions): Table {
  const columns = Math.max(options.header?.length ?? 0, ...options.rows.map((row) => row.length), 1);
  const fractions = options.widths?.length === columns ? options.widths : Array.from({ length: columns }, () => 1 / columns);
  const columnWidths = fractions.map((f) => Math.floor(f * options.widthTwips));
  const cell = (content: ParagraphChild[] | undefined, column: number, head: boolean) =>
    new TableCell({
      width: { size: columnWidths[column], type: WidthType.DXA },
      shading: head ? { type: ShadingType.CLEAR, color: "auto", fill: HEADER_FILL } : undefined,
      margins: { top: 30, bottom: 30, left: 80, right: 80 },
      children: [
        new Paragraph({
          style: head ? "TableHead" : options.align?.[column] === "right" ? "TableNumber" : "TableText",
          alignment: ALIGN[options.align?.[column] ?? "left"],
          children: content ?? [],
        }),
      ],
    });
  const row = (cells: ParagraphChild[][], head: boolean) =>
    new TableRow({ tableHeader: head || undefined, cantSplit: true, children: Array.from({ length: columns }, (_, c) => cell(cells[c], c, head)) });

  const rows = [...(options.header ? [row(options.header, true)] : []), ...options.rows.map((r) => row(r, false))];
  if (rows.length === 0) rows.push(row([], false));
  return new Table({ rows, columnWidths, width: { size: options.widthTwips, type: WidthType.DXA }, borders: BORDERS });
}

/** A table of formatted strings (calc inputs, appendices, front matter), with its caption above. */
export function docxStringTable(table: ReportTable, widthTwips: number, widths?: number[]): (Paragraph | Table)[] {
  const text = (value: string) => [new TextRun({ text: value })];
  const grid = docxGrid({ header: table.header.length > 0 ? table.header.map(text) : null, rows: table.rows.map((r) => r.map(text)), align: table.align, widths, widthTwips });
  return [...(table.caption ? [new Paragraph({ style: "Caption", children: [new TextRun(table.caption)] })] : []), grid, spacer()];
}

/** A small gap after a table, so the next paragraph does not touch its border. */
export const spacer = () => new Paragraph({ spacing: { before: 0, after: 60 }, children: [] });
