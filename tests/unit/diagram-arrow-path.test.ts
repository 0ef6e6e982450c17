import { describe, expect, it } from "vitest";
import { arrowLength, arrowPath } from "@/components/diagrams/arrow-path";
import { arrowLabelPosition, forceArrows } from "@/components/diagrams/force-arrows";
import { jointLoadVectors, reactionVectors } from "@/components/diagrams/force-vectors";

describe("arrowPath", () => {
  it("puts the tail behind the tip along the direction", () => {
    const a = arrowPath({ tip: { x: 100, y: 100 }, direction: { x: 0, y: 5 }, length: 40 });
    expect(a?.tail).toEqual({ x: 100, y: 60 });
    expect(a?.shaft).toBe("M100 60L100 92");
    expect(a?.head.startsWith("M100 100")).toBe(true);
  });

  it("keeps a shaft on a short arrow by shrinking the head", () => {
    const a = arrowPath({ tip: { x: 0, y: 0 }, direction: { x: 1, y: 0 }, length: 6, head: 8 });
    expect(a?.shaft).toBe("M-6 0L-3 0");
  });

  it("returns null for a zero direction or length", () => {
    expect(arrowPath({ tip: { x: 0, y: 0 }, direction: { x: 0, y: 0 }, length: 10 })).toBeNull();
    expect(arrowPath({ tip: { x: 0, y: 0 }, direction: { x: 1, y: 0 }, length: 0 })).toBeNull();
  });
});

describe("arrowLength", () => {
  it("scales from the minimum to the maximum by the largest force", () => {
    expect(arrowLength(10, 10, { min: 20, max: 40 })).toBe(40);
    expect(arrowLength(5, 10, { min: 20, max: 40 })).toBe(30);
    expect(arrowLength(0, 10, { min: 20, max: 40 })).toBe(20);
    expect(arrowLength(5, 0, { min: 20, max: 40 })).toBe(20);
  });
});

describe("jointLoadVectors", () => {
  it("sums loads per joint and splits them into components", () => {
    const v = jointLoadVectors([{ joint: "A", fy: -5 }, { joint: "A", fy: -5, fx: 2 }, { joint: "B", fx: 0 }]);
    expect(v).toEqual([{ joint: "A", fx: 2, fy: 0 }, { joint: "A", fx: 0, fy: -10 }]);
  });
});

describe("reactionVectors", () => {
  it("draws components for a pin and a resultant along an inclined roller", () => {
    const v = reactionVectors(
      [{ joint: "A", type: "pin" }, { joint: "B", type: "roller", direction: [1, 1] }],
      { A: { rx: 3, ry: 4 }, B: { rx: 2, ry: 2 } },
    );
    expect(v).toEqual([{ joint: "A", fx: 3, fy: 0 }, { joint: "A", fx: 0, fy: 4 }, { joint: "B", fx: 2, fy: 2 }]);
  });
});

describe("forceArrows", () => {
  const at = (j: string) => (j === "C" ? { x: 200, y: 100 } : undefined);

  it("points a downward load at its joint from above, stopping short by the gap", () => {
    const [a] = forceArrows({ vectors: [{ joint: "C", fx: 0, fy: -10 }], at, largest: 10, gap: 7, unit: "kN", min: 20, max: 40 });
    expect(a.path.tip).toEqual({ x: 200, y: 93 });
    expect(a.path.tail).toEqual({ x: 200, y: 53 });
    expect(a.text).toBe("10 kN");
  });

  it("scales every arrow to the largest force", () => {
    const arrows = forceArrows({ vectors: [{ joint: "C", fx: 0, fy: -10 }, { joint: "C", fx: 5, fy: 0 }], at, largest: 10, gap: 0, unit: "", min: 20, max: 40 });
    expect(arrows.map((a) => Math.hypot(a.path.tip.x - a.path.tail.x, a.path.tip.y - a.path.tail.y))).toEqual([40, 30]);
  });

  it("skips loads at joints that are not drawn", () => {
    expect(forceArrows({ vectors: [{ joint: "Z", fx: 1, fy: 0 }], at, largest: 1, gap: 0, unit: "" })).toEqual([]);
  });

  it("labels a vertical arrow past its tail and a horizontal one above its shaft", () => {
    const v = arrowPath({ tip: { x: 0, y: 0 }, direction: { x: 0, y: 1 }, length: 30 });
    const h = arrowPath({ tip: { x: 0, y: 0 }, direction: { x: 1, y: 0 }, length: 30 });
    if (!v || !h) throw new Error("arrows expected");
    expect(arrowLabelPosition(v)).toEqual({ x: 0, y: -38, anchor: "middle" });
    expect(arrowLabelPosition(h)).toEqual({ x: -15, y: -8, anchor: "middle" });
  });
});
