import { describe, expect, it } from "vitest";
import { lineLoadRows, lineLoadsFromRows } from "@/components/editor/nodes/truss/line-load-rows";
import { mergeCaseRows, type CaseRow } from "@/components/editor/nodes/truss/merge-case-rows";
import { remapErrorKeys } from "@/components/editor/nodes/truss/remap-error-keys";
import { supportRows, supportsFromRows } from "@/components/editor/nodes/truss/support-rows";
import type { LoadCaseDraft } from "@/components/editor/nodes/truss/truss-draft";

describe("support rows", () => {
  it("split a roller's reaction line into two columns and back", () => {
    const supports = [{ joint: "L0", type: "pin" as const }, { joint: "L6", type: "roller" as const, direction: [1, 2] as [number, number] }];
    const rows = supportRows(supports);
    expect(rows[1]).toEqual({ joint: "L6", type: "roller", dx: 1, dy: 2 });
    expect(supportsFromRows(rows)).toEqual(supports);
  });

  it("read one blank component as zero, so x alone gives a horizontal reaction line", () => {
    expect(supportsFromRows([{ joint: "A", type: "roller", dx: 1 }])).toEqual([{ joint: "A", type: "roller", direction: [1, 0] }]);
  });
});

describe("line load rows", () => {
  it("write the chord out as joint ids and read spaces, commas or semicolons back", () => {
    const rows = lineLoadRows([{ case: "Q", chord: ["L0", "L1", "L2"], w: 6.25, projected: true }]);
    expect(rows).toEqual([{ case: "Q", chord: "L0 L1 L2", w: 6.25, projected: "projected" }]);
    expect(lineLoadsFromRows([{ ...rows[0], chord: "L0, L1;L2", projected: "along" }])[0]).toEqual({ case: "Q", chord: ["L0", "L1", "L2"], w: 6.25, projected: false });
  });

  it("keep a separator just typed, so the next joint can be typed after it", () => {
    const typed = lineLoadsFromRows([{ case: "Q", chord: "L0 L1 ", w: 1, projected: "projected" }]);
    expect(lineLoadRows(typed)[0].chord).toBe("L0 L1 ");
    expect(lineLoadsFromRows([{ case: "Q", chord: "", w: 1, projected: "projected" }])[0].chord).toEqual([]);
  });
});

describe("mergeCaseRows", () => {
  const cases: LoadCaseDraft[] = [
    { id: "G", kind: "G", loads: [{ joint: "A", fy: -1 }] },
    { id: "Q", kind: "Q", loads: [{ joint: "B", fy: -2 }] },
    { id: "W", kind: "W", loads: [{ joint: "C", fx: 3 }] },
  ];
  const rows: CaseRow[] = cases.map((c) => ({ id: c.id, kind: c.kind }));

  it("keeps each case's loads when its id is renamed", () => {
    const after = rows.map((r, i) => (i === 1 ? { ...r, id: "L" } : r));
    expect(mergeCaseRows(cases, rows, after)[1]).toEqual({ id: "L", kind: "Q", loads: [{ joint: "B", fy: -2 }] });
  });

  it("drops the loads of the removed case only", () => {
    const merged = mergeCaseRows(cases, rows, rows.filter((_, i) => i !== 1));
    expect(merged.map((c) => [c.id, c.loads[0].joint])).toEqual([["G", "A"], ["W", "C"]]);
  });

  it("gives a new case no loads", () => {
    expect(mergeCaseRows(cases, rows, [...rows, { id: "S", kind: "S" }])[3]).toEqual({ id: "S", kind: "S", loads: [] });
  });
});

describe("remapErrorKeys", () => {
  it("moves a support's direction error onto the column that shows it", () => {
    expect(remapErrorKeys({ "1.direction": "zero direction", "0.joint": "no joint" }, { direction: "dx" })).toEqual({ "1.dx": "zero direction", "0.joint": "no joint" });
  });
});
