import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { nds } from "@/lib/solve/design";
import { rendersAll, invalidPath } from "../support/solve-assertions";

describe("nds.columnStability", () => {
  it("keeps Cp between 0 and 1 and below both 1 and FcE/Fc*", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 60, noNaN: true }),
        fc.constantFrom<"sawn" | "round" | "glulam">("sawn", "round", "glulam"),
        (slenderness, c) => {
          const r = nds.columnStability({ FcStar: 1200, EminPrime: 600000, le: slenderness * 3.5, d: 3.5, c });
          expect(r.Cp).toBeGreaterThan(0);
          expect(r.Cp).toBeLessThanOrEqual(1);
          expect(r.Cp).toBeLessThanOrEqual((r.FcE ?? Infinity) / 1200 + 1e-12);
          expect(r.FcPrime).toBeCloseTo(1200 * r.Cp, 9);
        },
      ),
    );
  });

  it("gives a higher Cp for glulam (c = 0.9) than for sawn lumber (c = 0.8)", () => {
    const base = { FcStar: 1500, EminPrime: 700000, le: 120, d: 5.5 };
    expect(nds.columnStability({ ...base, c: "glulam" }).Cp).toBeGreaterThan(nds.columnStability({ ...base, c: "sawn" }).Cp);
  });

  it("stays accurate for stocky columns where Eq. 3.7-1 as written cancels", () => {
    const r = nds.columnStability({ FcStar: 1000, EminPrime: 1e9, le: 1, d: 10, c: 0.8 });
    expect(r.Cp).toBeLessThanOrEqual(1);
    expect(1 - r.Cp).toBeGreaterThan(0);
    expect(1 - r.Cp).toBeLessThan(1e-6);
  });

  it("gives Cp = 1 and no FcE at zero length", () => {
    const r = nds.columnStability({ FcStar: 1000, EminPrime: 500000, le: 0, d: 3.5, c: "sawn" });
    expect(r.FcE).toBeNull();
    expect(r.Cp).toBe(1);
    rendersAll(r.steps);
  });

  it("reports le/d over 50 without refusing", () => {
    const ok = nds.columnStability({ FcStar: 1000, EminPrime: 500000, le: 175, d: 3.5, c: "sawn" });
    expect(ok.slendernessOk).toBe(true);
    const r = nds.columnStability({ FcStar: 1000, EminPrime: 500000, le: 200, d: 3.5, c: "sawn" });
    expect(r.slendernessOk).toBe(false);
    expect(r.warnings).toHaveLength(1);
    rendersAll(r.steps);
  });

  it("names the field for c out of range, an unknown product and a zero dimension", () => {
    const base = { FcStar: 1000, EminPrime: 500000, le: 96, d: 3.5, c: "sawn" as const };
    expect(invalidPath(() => nds.columnStability({ ...base, c: 1.2 }))).toBe("c");
    expect(invalidPath(() => nds.columnStability({ ...base, c: "pine" as "sawn" }))).toBe("c");
    expect(invalidPath(() => nds.columnStability({ ...base, d: 0 }))).toBe("d");
  });
});
