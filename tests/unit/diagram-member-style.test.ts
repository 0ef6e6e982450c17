import { describe, expect, it } from "vitest";
import { PALETTE } from "@/components/diagrams/diagram-palette";
import { forceSense, invalidMemberStyle, maxAbsForce, memberStyle } from "@/components/diagrams/member-style";

describe("memberStyle", () => {
  it("draws tension as a solid blue line", () => {
    const s = memberStyle(10, 20);
    expect(s).toMatchObject({ sense: "tension", color: PALETTE.tension });
    expect(s.dash).toBeUndefined();
    expect(s.core).toBeUndefined();
  });

  it("draws compression as a brick double line, not just a different colour", () => {
    const s = memberStyle(-10, 20);
    expect(s).toMatchObject({ sense: "compression", color: PALETTE.compression });
    expect(s.core).toBeGreaterThan(0);
    expect(s.core).toBeLessThan(s.width);
  });

  it("draws zero-force members thin, grey and dotted", () => {
    const s = memberStyle(0, 20);
    expect(s).toMatchObject({ sense: "zero", color: PALETTE.inkFaint });
    expect(s.dash).toBeDefined();
    expect(s.width).toBeLessThan(memberStyle(0.001, 20).width);
  });

  it("treats solver round-off relative to the largest force as zero", () => {
    expect(memberStyle(3e-8, 100).sense).toBe("zero");
    expect(memberStyle(1e-3, 100).sense).toBe("tension");
  });

  it("grows the width linearly with |N| between the clamps", () => {
    const o = { minWidth: 2, maxWidth: 8 };
    expect(memberStyle(50, 100, o).width).toBeCloseTo(5);
    expect(memberStyle(100, 100, o).width).toBeCloseTo(8);
    expect(memberStyle(250, 100, o).width).toBeCloseTo(8);
    expect(memberStyle(1e-3, 100, o).width).toBeCloseTo(2, 2);
  });

  it("keeps a lightly loaded compression member wide enough to show both rims", () => {
    expect(memberStyle(-0.01, 100, { minWidth: 1 }).width).toBeGreaterThanOrEqual(3);
  });

  it("draws a member with no result (or a non-finite one) in plain ink", () => {
    expect(memberStyle(undefined, 10)).toMatchObject({ sense: "unknown", color: PALETTE.ink });
    expect(memberStyle(Number.NaN, 10).sense).toBe("unknown");
  });

  it("marks an invalid member with the caution colour and dashes whatever its force", () => {
    const s = invalidMemberStyle(memberStyle(-5, 5));
    expect(s.color).toBe(PALETTE.caution);
    expect(s.dash).toBeDefined();
    expect(s.core).toBeUndefined();
  });
});

describe("forceSense and maxAbsForce", () => {
  it("names the sense with tension positive", () => {
    expect(forceSense(2, 2)).toBe("tension");
    expect(forceSense(-2, 2)).toBe("compression");
    expect(forceSense(0, 0)).toBe("zero");
  });

  it("finds the largest magnitude and ignores non-finite forces", () => {
    expect(maxAbsForce({ a: 3, b: -7, c: Number.NaN })).toBe(7);
    expect(maxAbsForce(undefined)).toBe(0);
  });
});
