import { describe, expect, it } from "vitest";
import { jointLabelPosition } from "@/components/diagrams/joint-label-position";
import { memberLabelPosition } from "@/components/diagrams/member-label-position";
import { niceLength } from "@/components/diagrams/nice-length";
import { sectionLine } from "@/components/diagrams/section-line";
import { supportRotation } from "@/components/diagrams/support-rotation";
import { wavePath } from "@/components/diagrams/wave-path";
import { formatNumber } from "@/components/diagrams/format-number";
import { freeBodyPart } from "@/components/diagrams/free-body-part";

describe("supportRotation", () => {
  it("leaves a vertical roller upright and turns a horizontal one to sit beside its joint", () => {
    expect(supportRotation(undefined)).toBe(0);
    expect(supportRotation([0, 1])).toBe(0);
    expect(supportRotation([1, 0])).toBe(90);
    expect(supportRotation([0, -1])).toBe(180);
    expect(supportRotation([-1, 0])).toBe(-90);
  });

  it("follows an inclined roller's line of reaction", () => {
    expect(supportRotation([1, 1])).toBeCloseTo(45);
    expect(supportRotation([0, 0])).toBe(0);
  });
});

describe("memberLabelPosition", () => {
  it("puts a horizontal member's label above its midpoint", () => {
    expect(memberLabelPosition({ x: 0, y: 100 }, { x: 100, y: 100 }, 10)).toEqual({ x: 50, y: 90, anchor: "middle" });
    expect(memberLabelPosition({ x: 100, y: 100 }, { x: 0, y: 100 }, 10)).toEqual({ x: 50, y: 90, anchor: "middle" });
  });

  it("puts a vertical member's label to its left, right-aligned", () => {
    expect(memberLabelPosition({ x: 50, y: 0 }, { x: 50, y: 100 }, 10)).toEqual({ x: 40, y: 50, anchor: "end" });
  });
});

describe("jointLabelPosition", () => {
  it("faces away from the joint's members", () => {
    const p = jointLabelPosition({ x: 0, y: 0 }, [{ x: 100, y: 0 }, { x: 0, y: -100 }], 10);
    expect(p.x).toBeLessThan(0);
    expect(p.y).toBeGreaterThan(0);
    expect(p.anchor).toBe("end");
  });

  it("goes above-left of a lone joint", () => {
    const p = jointLabelPosition({ x: 0, y: 0 }, [], 10);
    expect(p.x).toBeLessThan(0);
    expect(p.y).toBeLessThan(0);
  });
});

describe("sectionLine", () => {
  it("runs through the cut members' midpoints and past the outer ones", () => {
    const top = { a: { x: 100, y: 0 }, b: { x: 200, y: 0 } };
    const diag = { a: { x: 100, y: 100 }, b: { x: 200, y: 0 } };
    const bottom = { a: { x: 100, y: 100 }, b: { x: 200, y: 100 } };
    const line = sectionLine([top, diag, bottom], 20);
    expect(line).toHaveLength(5);
    expect(line.slice(1, 4).map((p) => p.x)).toEqual([150, 150, 150]);
    const ys = line.map((p) => p.y);
    expect(Math.min(...ys)).toBeCloseTo(-20);
    expect(Math.max(...ys)).toBeCloseTo(120);
  });

  it("cuts a single member square across", () => {
    const line = sectionLine([{ a: { x: 0, y: 50 }, b: { x: 100, y: 50 } }], 20);
    expect(line.map((p) => Math.round(p.x))).toEqual([50, 50, 50]);
    expect(Math.abs(line[0].y - line[2].y)).toBeCloseTo(40);
  });

  it("is empty when nothing is cut", () => {
    expect(sectionLine([])).toEqual([]);
  });
});

describe("wavePath", () => {
  it("meets every vertex of the polyline", () => {
    const d = wavePath([{ x: 0, y: 0 }, { x: 0, y: 28 }, { x: 28, y: 28 }], { wavelength: 14 });
    expect(d.startsWith("M0 0")).toBe(true);
    expect(d).toContain(" 0 28Q");
    expect(d.endsWith(" 28 28")).toBe(true);
  });

  it("is empty for fewer than two points", () => {
    expect(wavePath([{ x: 1, y: 1 }])).toBe("");
  });
});

describe("niceLength and formatNumber", () => {
  it("picks the longest 1-2-5 length that fits", () => {
    expect(niceLength(7.3)).toBe(5);
    expect(niceLength(3)).toBe(2);
    expect(niceLength(0.12)).toBe(0.1);
    expect(niceLength(20)).toBe(20);
    expect(niceLength(0)).toBe(0);
  });

  it("formats labels to three figures with a true minus and without dropping integer digits", () => {
    expect(formatNumber(42.345)).toBe("42.3");
    expect(formatNumber(-1.25)).toBe("\u22121.25");
    expect(formatNumber(1234.6)).toBe("1235");
    expect(formatNumber(1e-12)).toBe("0");
    expect(formatNumber(Number.NaN)).toBe("—");
  });
});

describe("freeBodyPart", () => {
  const kept = new Set(["A", "B"]);
  it("tells kept, dropped and cut members apart, naming the kept end", () => {
    expect(freeBodyPart("A", "B", kept)).toBe("kept");
    expect(freeBodyPart("C", "D", kept)).toBe("dropped");
    expect(freeBodyPart("C", "A", kept)).toEqual({ cutKeeps: "end" });
  });
});
