import { describe, expect, it } from "vitest";
import { estimateTextWidth, labelBox, placeLabels } from "@/components/diagrams/place-labels";

describe("labelBox", () => {
  it("spans the text from its anchor", () => {
    expect(labelBox({ x: 10, y: 10, anchor: "start" }, 20, 10)).toEqual({ x0: 10, y0: 5, x1: 30, y1: 15 });
    expect(labelBox({ x: 10, y: 10, anchor: "end" }, 20, 10)).toEqual({ x0: -10, y0: 5, x1: 10, y1: 15 });
    expect(labelBox({ x: 10, y: 10, anchor: "middle" }, 20, 10)).toEqual({ x0: 0, y0: 5, x1: 20, y1: 15 });
  });
});

describe("placeLabels", () => {
  const spot = (x: number, y: number) => ({ x, y, anchor: "middle" as const });

  it("gives each label its first free candidate", () => {
    const placed = placeLabels([
      { key: "a", candidates: [spot(0, 0), spot(0, 50)], width: 20, height: 10 },
      { key: "b", candidates: [spot(5, 0), spot(5, 30)], width: 20, height: 10 },
    ]);
    expect(placed.get("a")).toEqual(spot(0, 0));
    expect(placed.get("b")).toEqual(spot(5, 30));
  });

  it("steers clear of obstacles", () => {
    const placed = placeLabels([{ key: "a", candidates: [spot(0, 0), spot(100, 0)], width: 10, height: 10 }], [{ x0: -20, y0: -20, x1: 20, y1: 20 }]);
    expect(placed.get("a")).toEqual(spot(100, 0));
  });

  it("keeps the conventional spot when every candidate is taken", () => {
    const placed = placeLabels([{ key: "a", candidates: [spot(0, 0), spot(1, 0)], width: 10, height: 10 }], [{ x0: -50, y0: -50, x1: 50, y1: 50 }]);
    expect(placed.get("a")).toEqual(spot(0, 0));
  });

  it("estimates text width from its length", () => {
    expect(estimateTextWidth("U1L2", 10)).toBeCloseTo(24);
  });
});
