import { describe, expect, it } from "vitest";
import { eulerLoad, sectionProperties } from "@/lib/solve/design";

function within(actual: number, expected: number, relative: number): void {
  expect(Math.abs(actual - expected) / expected).toBeLessThanOrEqual(relative);
}

describe("closed forms", () => {
  it("solid round D = 2", () => {
    const p = sectionProperties({ shape: "round", D: 2 });
    expect(p.A).toBeCloseTo(3.14159, 5); // closed form: πD²/4
    expect(p.Ix).toBeCloseTo(0.785398, 6); // closed form: πD⁴/64
    expect(p.rmin).toBeCloseTo(0.5, 12); // closed form: D/4
  });

  it("solid rectangle 2 × 4", () => {
    const p = sectionProperties({ shape: "rectangle", b: 2, h: 4 });
    expect(p.A).toBe(8); // closed form: bh
    expect(p.Ix).toBeCloseTo(10.6667, 4); // closed form: bh³/12
    expect(p.Iy).toBeCloseTo(2.6667, 4); // closed form: hb³/12
  });

  it("CHS D = 100, t = 10", () => {
    const p = sectionProperties({ shape: "chs", D: 100, t: 10 });
    expect(p.A).toBeCloseTo(2827.43, 2); // closed form: π(100² − 80²)/4
    expect(p.Ix).toBeCloseTo(2898119, 0); // closed form: π(100⁴ − 80⁴)/64
  });

  it("RHS 100 × 50 × 5 with sharp corners", () => {
    const p = sectionProperties({ shape: "rhs", b: 50, h: 100, t: 5 });
    expect(p.A).toBe(1400); // closed form: 50·100 − 40·90
    expect(p.Ix).toBeCloseTo(1736666.67, 1); // closed form: (50·100³ − 40·90³)/12
  });

  it("channel 100 × 50, tf = 10, tw = 6", () => {
    const p = sectionProperties({ shape: "channel", d: 100, bf: 50, tf: 10, tw: 6 });
    expect(p.A).toBe(1480); // closed form: 2·50·10 + 80·6
    expect(p.Ix).toBeCloseTo(2289333.33, 1); // closed form: (50·100³ − 44·80³)/12
  });

  it("Euler load of a pin-ended strut", () => {
    expect(eulerLoad({ E: 200000, I: 1e6, L: 3000 })).toBeCloseTo(219324.5, 0); // closed form: π² × 200 000 × 10⁶ / 3000²
  });
});

describe("handbook shapes (fillets, toe radii and taper ignored, hence the tolerances)", () => {
  it("L4×4×1/4", () => {
    const p = sectionProperties({ shape: "angle", d: 4, b: 4, t: 0.25 });
    within(p.A, 1.93, 0.01); // Source: AISC Steel Construction Manual 15th ed., Table 1-7 (from memory)
    within(p.Ix, 3.0, 0.02); // Source: AISC Steel Construction Manual 15th ed., Table 1-7 (from memory)
    within(p.rmin, 0.795, 0.01); // Source: AISC Steel Construction Manual 15th ed., Table 1-7, rz (from memory)
  });

  it("HSS6×6×1/4 with design wall 0.233 in and outside corner radius 2t", () => {
    const p = sectionProperties({ shape: "rhs", b: 6, h: 6, t: 0.233, cornerRadius: 0.466 });
    within(p.A, 5.24, 0.005); // Source: AISC Steel Construction Manual 15th ed., Table 1-12 (from memory)
    within(p.Ix, 28.6, 0.005); // Source: AISC Steel Construction Manual 15th ed., Table 1-12 (from memory)
    within(p.rmin, 2.34, 0.005); // Source: AISC Steel Construction Manual 15th ed., Table 1-12 (from memory)
  });

  it("Pipe 4 Std with design wall 0.93 × 0.237 in", () => {
    const p = sectionProperties({ shape: "chs", D: 4.5, t: 0.93 * 0.237 });
    within(p.A, 2.96, 0.005); // Source: AISC Steel Construction Manual 15th ed., Table 1-14 (from memory)
    within(p.rmin, 1.51, 0.005); // Source: AISC Steel Construction Manual 15th ed., Table 1-14 (from memory)
  });

  it("C10×15.3 (area and strong axis only; the tapered flange moves Iy)", () => {
    const p = sectionProperties({ shape: "channel", d: 10, bf: 2.6, tf: 0.436, tw: 0.24 });
    within(p.A, 4.48, 0.01); // Source: AISC Steel Construction Manual 15th ed., Table 1-5 (from memory)
    within(p.Ix, 67.3, 0.01); // Source: AISC Steel Construction Manual 15th ed., Table 1-5 (from memory)
  });

  it("2×6 sawn lumber, 1.5 × 5.5 in dressed", () => {
    const p = sectionProperties({ shape: "timber", b: 1.5, d: 5.5, product: "sawn" });
    expect(p.A).toBeCloseTo(8.25, 3); // Source: NDS Supplement 2018, Table 1B (from memory)
    expect(p.Ix).toBeCloseTo(20.8, 2); // Source: NDS Supplement 2018, Table 1B (from memory)
    expect(p.Iy).toBeCloseTo(1.547, 3); // Source: NDS Supplement 2018, Table 1B (from memory)
  });
});
