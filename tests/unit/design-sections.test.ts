import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { sectionProperties } from "@/lib/solve/design";
import type { SectionShape } from "@/lib/solve/design";
import { rendersAll, invalidPath } from "../support/solve-assertions";

const EVERY_SHAPE: SectionShape[] = [
  { shape: "angle", d: 100, b: 75, t: 8 },
  { shape: "double-angle", d: 100, b: 75, t: 8, gap: 10 },
  { shape: "channel", d: 200, bf: 75, tf: 11, tw: 7 },
  { shape: "chs", D: 114.3, t: 6 },
  { shape: "rhs", b: 150, h: 100, t: 6 },
  { shape: "rhs", b: 150, h: 100, t: 6, cornerRadius: 12 },
  { shape: "round", D: 20 },
  { shape: "rectangle", b: 50, h: 10 },
  { shape: "timber", b: 38, d: 140, product: "sawn" },
];

describe("sectionProperties", () => {
  it.each(EVERY_SHAPE)("gives r = √(I/A) and rmin no larger than rx or ry for %o", (shape) => {
    const p = sectionProperties(shape, { units: { length: "mm" } });
    expect(p.rx).toBeCloseTo(Math.sqrt(p.Ix / p.A), 12);
    expect(p.ry).toBeCloseTo(Math.sqrt(p.Iy / p.A), 12);
    expect(p.rmin).toBeLessThanOrEqual(Math.min(p.rx, p.ry) + 1e-12);
    rendersAll(p.steps);
    expect(p.steps.some((s) => s.latex.includes("\\mathrm{mm^{2}}"))).toBe(true);
  });

  it("gives an equal angle's minor principal axis a smaller r than the leg axes", () => {
    const p = sectionProperties({ shape: "angle", d: 100, b: 100, t: 10 });
    expect(p.Ix).toBeCloseTo(p.Iy, 9);
    expect(p.rmin).toBeLessThan(p.rx * 0.8);
  });

  it("keeps an angle's principal moments summing to Ix + Iy (invariant of rotation)", () => {
    fc.assert(
      fc.property(fc.double({ min: 20, max: 200, noNaN: true }), fc.double({ min: 20, max: 200, noNaN: true }), fc.double({ min: 0.05, max: 0.45, noNaN: true }), (d, b, tr) => {
        const t = tr * Math.min(d, b);
        const p = sectionProperties({ shape: "angle", d, b, t });
        const Imax = p.Ix + p.Iy - p.Imin;
        expect(p.Imin).toBeGreaterThan(0);
        expect(p.Imin).toBeLessThanOrEqual(Math.min(p.Ix, p.Iy) + 1e-9);
        expect(Imax).toBeGreaterThanOrEqual(Math.max(p.Ix, p.Iy) - 1e-9);
      }),
    );
  });

  it("makes a double angle twice the single angle in A and Ix, and stiffer about y as the gap opens", () => {
    const single = sectionProperties({ shape: "angle", d: 100, b: 75, t: 8 });
    const tight = sectionProperties({ shape: "double-angle", d: 100, b: 75, t: 8, gap: 0 });
    const open = sectionProperties({ shape: "double-angle", d: 100, b: 75, t: 8, gap: 20 });
    expect(tight.A).toBeCloseTo(2 * single.A, 9);
    expect(tight.Ix).toBeCloseTo(2 * single.Ix, 9);
    expect(open.Iy).toBeGreaterThan(tight.Iy);
    expect(open.Ix).toBeCloseTo(tight.Ix, 9);
  });

  it("makes rounded corners reduce an RHS area and stiffness a little", () => {
    const sharp = sectionProperties({ shape: "rhs", b: 150, h: 100, t: 6 });
    const round = sectionProperties({ shape: "rhs", b: 150, h: 100, t: 6, cornerRadius: 12 });
    expect(round.A).toBeLessThan(sharp.A);
    expect(round.Ix).toBeLessThan(sharp.Ix);
    // Each corner loses an r × r square less a quarter disc: (4 − π) r² in all, outside less inside.
    expect(sharp.A - round.A).toBeCloseTo((4 - Math.PI) * (12 ** 2 - 6 ** 2), 9);
  });

  it("turns into the solid round when a CHS wall reaches the centre", () => {
    const hollow = sectionProperties({ shape: "chs", D: 50, t: 25 });
    const solid = sectionProperties({ shape: "round", D: 50 });
    expect(hollow.A).toBeCloseTo(solid.A, 9);
    expect(hollow.Ix).toBeCloseTo(solid.Ix, 9);
  });

  it("names the offending dimension", () => {
    expect(invalidPath(() => sectionProperties({ shape: "angle", d: 50, b: 50, t: 60 }))).toBe("t");
    expect(invalidPath(() => sectionProperties({ shape: "chs", D: 50, t: 30 }))).toBe("t");
    expect(invalidPath(() => sectionProperties({ shape: "rhs", b: 50, h: 40, t: 3, cornerRadius: 30 }))).toBe("cornerRadius");
    expect(invalidPath(() => sectionProperties({ shape: "channel", d: 100, bf: 50, tf: 60, tw: 5 }))).toBe("tf");
    expect(invalidPath(() => sectionProperties({ shape: "round", D: -1 }))).toBe("D");
    expect(invalidPath(() => sectionProperties({ shape: "hexagon" } as unknown as SectionShape))).toBe("shape");
  });
});
