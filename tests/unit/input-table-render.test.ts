import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CsvImport } from "@/components/editor/input-table/csv-import";
import type { InputColumn } from "@/components/editor/input-table/input-column";
import { InputTable, type InputTableProps } from "@/components/editor/input-table/input-table";

type JointRow = { id: string; x?: number; y?: number; type?: string };
const columns: InputColumn<JointRow>[] = [
  { key: "id", label: "Label", kind: "text", width: "5rem" },
  { key: "x", label: "x", unit: "m", kind: "number" },
  { key: "y", label: "y", unit: "m", kind: "number" },
  { key: "type", label: "Support", kind: "select", options: [{ value: "pin", label: "Pin" }, { value: "roller", label: "Roller" }] },
];
const rows: JointRow[] = [{ id: "L0", x: 0, y: 0, type: "pin" }, { id: "L1", x: 4.5, y: 0, type: "roller" }];
const render = (props: Partial<InputTableProps<JointRow>> = {}) =>
  renderToStaticMarkup(createElement(InputTable<JointRow>, { columns, rows, onChange: () => undefined, caption: "Joints", ...props }));

describe("InputTable", () => {
  it("has column headers with the unit in its own case", () => {
    const html = render();
    expect(html).toContain('<th scope="col">Label</th>');
    expect(html).toContain('x<span class="normal-case tracking-normal text-ink-faint"> (m)</span>');
    expect(html).toContain('aria-label="Joints"');
    expect(html).toContain('<caption class="sr-only">Joints</caption>');
  });

  it("labels every input with its column, unit and row", () => {
    const html = render({ rowName: (r) => `joint ${r.id}` });
    expect(html).toContain('aria-label="x (m), joint L1"');
    expect(html).toContain('aria-label="Support, joint L0"');
    expect(html).toContain('aria-label="Remove joint L1"');
  });

  it("shows numbers in the mono font, right-aligned, with a decimal keypad", () => {
    const html = render();
    expect(html).toMatch(/inputMode="decimal"[^>]*class="pp-input px-1.5 py-1 pp-num text-right"[^>]*value="4.5"/);
  });

  it("marks an invalid field and says what is wrong under it", () => {
    const html = render({ errors: { "1.x": "Joint L1 coincides with L0" } });
    const describedBy = html.match(/aria-invalid="true" aria-describedby="([^"]+)"/)?.[1];
    expect(describedBy).toBeTruthy();
    expect(html).toContain(`id="${describedBy}" class="pp-error block">Joint L1 coincides with L0</span>`);
    expect(html.match(/aria-invalid/g)?.length).toBe(1);
  });

  it("gives each cell a grid position for keyboard movement", () => {
    const html = render();
    expect(html).toContain('data-cell="1.2"');
    expect(html).toContain('data-cell="1.4"');
  });

  it("offers add and remove buttons while editable", () => {
    const html = render({ addLabel: "Add joint" });
    expect(html).toContain("+ Add joint");
    expect(html.match(/aria-label="Remove row/g)?.length).toBe(2);
  });

  it("read-only, shows plain values with option labels and no controls", () => {
    const html = render({ readOnly: true, errors: { "0.y": "y is missing" } });
    expect(html).not.toContain("<input");
    expect(html).not.toContain("<button");
    expect(html).toContain('<td class="pp-num text-right">4.5</td>');
    expect(html).toContain(">Roller</td>");
    expect(html).toContain("y is missing");
  });

  it("says so when there are no rows", () => {
    expect(render({ rows: [] })).toContain("No rows yet");
  });
});

describe("CsvImport", () => {
  it("is a labelled file picker for CSV", () => {
    const html = renderToStaticMarkup(createElement(CsvImport<JointRow>, { columns, onImport: () => undefined, label: "Import joints (CSV)" }));
    const id = html.match(/<label for="([^"]+)"/)?.[1];
    expect(id).toBeTruthy();
    expect(html).toContain(`id="${id}" type="file" accept=".csv,.txt,text/csv,text/plain"`);
    expect(html).toContain("Import joints (CSV)");
  });
});
