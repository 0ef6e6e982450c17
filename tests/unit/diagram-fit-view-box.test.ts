import { describe, expect, it } from "vitest";
import { fitViewBox } from "@/components/diagrams/fit-view-box";

describe("fitViewBox", () => {
  it("uses one scale for x and y so the drawing is to scale", () => {
    const v = fitViewBox({ points: [{ x: 0, y: 0 }, { x: 24, y: 3 }], width: 720, maxHeight: 420, margin: 60 });
    expect(v.scale).toBeCloseTo(600 / 24);
    const a = v.toSvg({ x: 0, y: 0 });
    const b = v.toSvg({ x: 24, y: 3 });
    expect(b.x - a.x).toBeCloseTo(24 * v.scale);
    expect(a.y - b.y).toBeCloseTo(3 * v.scale);
  });

  it("flips y so that model up is SVG up", () => {
    const v = fitViewBox({ points: [{ x: 0, y: 0 }, { x: 4, y: 3 }] });
    expect(v.toSvg({ x: 2, y: 3 }).y).toBeLessThan(v.toSvg({ x: 2, y: 0 }).y);
  });

  it("keeps the margins clear on every side", () => {
    const v = fitViewBox({ points: [{ x: -5, y: -2 }, { x: 5, y: 8 }], width: 500, maxHeight: 500, margin: { top: 10, right: 20, bottom: 30, left: 40 } });
    for (const p of [{ x: -5, y: -2 }, { x: 5, y: 8 }]) {
      const s = v.toSvg(p);
      expect(s.x).toBeGreaterThanOrEqual(40 - 1e-9);
      expect(s.x).toBeLessThanOrEqual(500 - 20 + 1e-9);
      expect(s.y).toBeGreaterThanOrEqual(10 - 1e-9);
      expect(s.y).toBeLessThanOrEqual(v.height - 30 + 1e-9);
    }
  });

  it("scales a tall tower down to the height limit and centres it across", () => {
    const v = fitViewBox({ points: [{ x: 0, y: 0 }, { x: 2, y: 40 }], width: 720, maxHeight: 420, margin: 60 });
    expect(v.height).toBeCloseTo(420);
    expect(v.scale).toBeCloseTo(300 / 40);
    const mid = (v.toSvg({ x: 0, y: 0 }).x + v.toSvg({ x: 2, y: 0 }).x) / 2;
    expect(mid).toBeCloseTo(360);
  });

  it("gives a flat row of joints the minimum height and centres it vertically", () => {
    const v = fitViewBox({ points: [{ x: 0, y: 0 }, { x: 10, y: 0 }], minHeight: 160, margin: 50 });
    expect(v.height).toBe(160);
    expect(v.toSvg({ x: 0, y: 0 }).y).toBeCloseTo(80);
  });

  it("places a single joint, or coincident joints, in the middle without dividing by zero", () => {
    for (const points of [[{ x: 3, y: 4 }], [{ x: 1, y: 1 }, { x: 1, y: 1 }]]) {
      const v = fitViewBox({ points, width: 400, minHeight: 200, margin: 40 });
      const s = v.toSvg(points[0]);
      expect(Number.isFinite(v.scale)).toBe(true);
      expect(s.x).toBeCloseTo(200);
      expect(s.y).toBeCloseTo(100);
    }
  });

  it("returns a usable drawing for no points and ignores non-finite ones", () => {
    const empty = fitViewBox({ points: [] });
    expect(empty.viewBox).toBe(`0 0 720 ${empty.height}`);
    const v = fitViewBox({ points: [{ x: Number.NaN, y: 0 }, { x: 0, y: 0 }, { x: 4, y: Infinity }, { x: 4, y: 0 }], margin: 60 });
    expect(v.scale).toBeCloseTo(600 / 4);
  });
});
