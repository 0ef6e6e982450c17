import { describe, expect, it } from "vitest";
import { aisc360, checkMember, en1993, eulerLoad, nds, sectionProperties } from "@/lib/solve/design";
import { rendersAll, invalidPath } from "../support/solve-assertions";

const angle = { shape: "angle" as const, d: 4, b: 4, t: 0.25 };
const steel = { material: "steel-aisc360" as const, Fy: 36, Fu: 58, E: 29000 };

describe("checkMember, steel to AISC 360-16", () => {
  it("checks a positive force in tension against φtPn", () => {
    const r = checkMember({ ...steel, force: 40, section: angle, length: 96, An: 1.6, U: 0.8 });
    const t = aisc360.tension({ Fy: 36, Fu: 58, Ag: sectionProperties(angle).A, An: 1.6, U: 0.8 });
    expect(r.mode).toBe("tension");
    expect(r.capacity).toBeCloseTo(t.phiPn, 12);
    expect(r.utilization).toBeCloseTo(40 / t.phiPn, 12);
    expect(r.governs).toContain("D2(b)");
    rendersAll(r.steps);
  });

  it("checks a negative force in compression about the least radius of gyration", () => {
    const r = checkMember({ ...steel, force: -20, section: angle, length: 96 });
    const p = sectionProperties(angle);
    const c = aisc360.compression({ Fy: 36, E: 29000, KLr: 96 / p.rmin });
    expect(r.mode).toBe("compression");
    expect(r.slenderness).toBeCloseTo(96 / p.rmin, 12);
    expect(r.capacity).toBeCloseTo(c.phiFcr * p.A, 12);
    expect(r.governs).toContain(c.equation);
    rendersAll(r.steps);
  });

  it("fails a member whose utilization exceeds 1.0 and passes the same member at a lower force", () => {
    const probe = checkMember({ ...steel, force: -1, section: angle, length: 96 });
    expect(checkMember({ ...steel, force: -1.01 * probe.capacity, section: angle, length: 96 }).pass).toBe(false);
    expect(checkMember({ ...steel, force: -0.99 * probe.capacity, section: angle, length: 96 }).pass).toBe(true);
  });

  it("gives a lower capacity in ASD by about 1.5", () => {
    const lrfd = checkMember({ ...steel, force: -10, section: angle, length: 60 });
    const asd = checkMember({ ...steel, force: -10, section: angle, length: 60, method: "ASD" });
    expect(lrfd.capacity / asd.capacity).toBeCloseTo(0.9 * 1.67, 9);
  });

  it("applies K to the buckling length", () => {
    const k1 = checkMember({ ...steel, force: -10, section: { shape: "properties", A: 2, rmin: 1 }, length: 100 });
    const k2 = checkMember({ ...steel, force: -10, section: { shape: "properties", A: 2, rmin: 1 }, length: 50, K: 2 });
    expect(k2.capacity).toBeCloseTo(k1.capacity, 12);
  });

  it("warns about a slender tension member (L/r > 300) but still checks it", () => {
    const r = checkMember({ ...steel, force: 5, section: { shape: "round", D: 0.75 }, length: 120 });
    expect(r.warnings.length).toBe(1);
    expect(r.pass).toBe(true);
  });
});

describe("checkMember, steel to EN 1993-1-1", () => {
  const base = { material: "steel-en1993" as const, fy: 355, fu: 490, E: 210000, curve: "c" as const };

  it("checks compression against Nb,Rd", () => {
    const section = { shape: "chs" as const, D: 88.9, t: 4 };
    const r = checkMember({ ...base, force: -80000, section, length: 2500 });
    const p = sectionProperties(section);
    const nb = en1993.compressionResistance({ A: p.A, fy: 355, E: 210000, Lcr: 2500, i: p.rmin, curve: "c" });
    expect(r.capacity).toBeCloseTo(nb.NbRd, 9);
    expect(r.governs).toContain("6.47");
    rendersAll(r.steps);
  });

  it("checks tension against Nt,Rd with the net area given", () => {
    const r = checkMember({ ...base, force: 100000, section: { shape: "properties", A: 1000, rmin: 20 }, length: 2000, Anet: 800 });
    expect(r.capacity).toBeCloseTo(en1993.tensionResistance({ A: 1000, fy: 355, Anet: 800, fu: 490 }).NtRd, 9);
    rendersAll(r.steps);
  });
});

describe("checkMember, timber to NDS 2018", () => {
  const base = { material: "timber-nds" as const, FcStar: 1150, FtPrime: 675, EminPrime: 580000, c: "sawn" as const };
  const section = { shape: "timber" as const, b: 1.5, d: 5.5 };

  it("buckles about the least dimension", () => {
    const r = checkMember({ ...base, force: -1500, section, length: 48 });
    const cs = nds.columnStability({ FcStar: 1150, EminPrime: 580000, le: 48, d: 1.5, c: "sawn" });
    expect(r.slenderness).toBeCloseTo(32, 12);
    expect(r.capacity).toBeCloseTo(cs.FcPrime * 1.5 * 5.5, 9);
    rendersAll(r.steps);
  });

  it("checks tension on the net area", () => {
    const r = checkMember({ ...base, force: 3000, section, length: 96, An: 6 });
    expect(r.capacity).toBeCloseTo(675 * 6, 12);
    expect(r.mode).toBe("tension");
  });

  it("asks for a rectangular section in compression", () => {
    expect(invalidPath(() => checkMember({ ...base, force: -100, section: { shape: "chs", D: 6, t: 1 }, length: 48 }))).toBe("section");
    expect(checkMember({ ...base, force: -100, section: { shape: "properties", A: 8.25, rmin: 0.433, d: 1.5 }, length: 48 }).mode).toBe("compression");
  });
});

describe("checkMember input", () => {
  it("names the field of a bad input", () => {
    expect(invalidPath(() => checkMember({ ...steel, force: Number.NaN, section: angle, length: 96 }))).toBe("force");
    expect(invalidPath(() => checkMember({ ...steel, force: 1, section: angle, length: -1 }))).toBe("length");
    expect(invalidPath(() => checkMember({ ...steel, force: 1, section: { ...angle, t: 9 }, length: 1 }))).toBe("section.t");
    expect(invalidPath(() => checkMember({ ...steel, material: "steel-bs5950" as "steel-aisc360", force: 1, section: angle, length: 1 }))).toBe("material");
  });
});

describe("eulerLoad", () => {
  it("falls with the square of the effective length", () => {
    const p1 = eulerLoad({ E: 29000, I: 10, L: 100 });
    expect(eulerLoad({ E: 29000, I: 10, L: 100, K: 2 })).toBeCloseTo(p1 / 4, 9);
    expect(eulerLoad({ E: 29000, I: 10, L: 200 })).toBeCloseTo(p1 / 4, 9);
  });

  it("refuses a zero length or negative modulus", () => {
    expect(invalidPath(() => eulerLoad({ E: 29000, I: 10, L: 0 }))).toBe("L");
    expect(invalidPath(() => eulerLoad({ E: -1, I: 10, L: 10 }))).toBe("E");
    expect(invalidPath(() => eulerLoad({ E: 1, I: 10, L: 10, K: 0 }))).toBe("K");
  });
});
