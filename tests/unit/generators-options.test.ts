import { describe, expect, it } from "vitest";
import { SolveError } from "@/lib/solve/errors";
import { generateTruss, type GenerateTrussOptions } from "@/lib/solve/generators";

/** Calls generateTruss with input that the types may not allow, as the editor's raw input might. */
function invalidPath(options: unknown): string | undefined {
  try {
    generateTruss(options as GenerateTrussOptions);
  } catch (e) {
    if (e instanceof SolveError && e.code === "INVALID") return e.path;
    throw e;
  }
  throw new Error("expected generateTruss to reject the options");
}

const pratt = { shape: "pratt", span: 24, panels: 4, depth: 3 };
const fink = { shape: "fink", span: 12, panels: 4, rise: 3 };

describe("generateTruss options", () => {
  it.each([
    ["zero", 0],
    ["negative", -4],
    ["fractional", 2.5],
    ["not a number", Number.NaN],
    ["a string", "4"],
  ])("rejects a panel count that is %s, naming panels", (_, panels) => {
    expect(invalidPath({ ...pratt, panels })).toBe("panels");
  });

  it.each(["pratt", "howe", "warren", "warren-verticals", "k", "parallel-chord"])("rejects an odd panel count for the symmetric %s", (shape) => {
    expect(invalidPath({ shape, span: 24, panels: 5, depth: 3 })).toBe("panels");
  });

  it.each(["pratt-pitched", "howe-pitched", "fink", "fan", "scissors"])("rejects an odd panel count for the symmetric %s", (shape) => {
    expect(invalidPath({ shape, span: 24, panels: 7, rise: 3 })).toBe("panels");
  });

  it("accepts an odd panel count for the mono-pitch, which has no midspan to meet", () => {
    expect(generateTruss({ shape: "mono-pitch", span: 9, panels: 3, rise: 2 }).model.joints).toHaveLength(7);
  });

  it("needs at least 4 panels for a Fink or fan, which have a W or fan to lay out", () => {
    expect(invalidPath({ ...fink, panels: 2 })).toBe("panels");
    expect(invalidPath({ ...fink, shape: "fan", panels: 2 })).toBe("panels");
  });

  it.each([
    ["span", 0],
    ["span", -1],
    ["span", Number.POSITIVE_INFINITY],
    ["depth", 0],
    ["depth", Number.NaN],
    ["A", 0],
    ["E", -200],
  ])("rejects %s = %s, naming it", (field, value) => {
    expect(invalidPath({ ...pratt, [field]: value })).toBe(field);
  });

  it("rejects a missing depth on a parallel-chord shape", () => {
    expect(invalidPath({ shape: "k", span: 24, panels: 4 })).toBe("depth");
  });

  it("rejects an unknown shape, naming shape", () => {
    expect(invalidPath({ ...pratt, shape: "bowstring" })).toBe("shape");
  });

  it("rejects an option the shape does not take, naming it", () => {
    expect(invalidPath({ ...fink, depth: 2 })).toBe("depth");
    expect(invalidPath({ ...pratt, rise: 2 })).toBe("rise");
  });

  it("needs exactly one of rise and pitch on a sloped shape", () => {
    expect(invalidPath({ shape: "fink", span: 12, panels: 4 })).toBe("rise");
    expect(invalidPath({ ...fink, pitch: 0.5 })).toBe("rise");
    expect(invalidPath({ ...fink, rise: undefined, pitch: -0.5 })).toBe("pitch");
  });

  it("keeps the scissors bottom chord below its top chord", () => {
    const scissors = { shape: "scissors", span: 24, panels: 4, rise: 4 };
    expect(invalidPath({ ...scissors, bottomRise: 4 })).toBe("bottomRise");
    expect(invalidPath({ ...scissors, bottomPitch: 0.5 })).toBe("bottomPitch");
    expect(invalidPath({ ...scissors, bottomRise: 1, bottomPitch: 0.1 })).toBe("bottomRise");
  });

  it("allows end posts only on the Pratt and Howe webs of a parallel-chord truss", () => {
    expect(invalidPath({ shape: "parallel-chord", span: 24, panels: 6, depth: 3, web: "warren", ends: "inclined" })).toBe("ends");
    expect(invalidPath({ ...pratt, ends: "curved" })).toBe("ends");
  });

  it("says in the message which option is wrong and why", () => {
    expect(() => generateTruss({ ...fink, panels: 5 } as GenerateTrussOptions)).toThrow("truss generator: panels: must be even for a symmetric shape");
  });
});
