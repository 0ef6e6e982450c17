import { describe, expect, it } from "vitest";
import { validateTruss } from "@/lib/solve/truss";
import type { TrussModel } from "@/lib/solve/types";
import { catchSolveError, seedTriangle } from "./truss-fixtures";

/** Validates `model`, expecting INVALID at `path`; returns the message. */
function invalidAt(model: unknown, path: string): string {
  const error = catchSolveError(() => validateTruss(model));
  expect(error.code).toBe("INVALID");
  expect(error.path).toBe(path);
  return error.message;
}

function triangleWith(change: (m: TrussModel) => void): TrussModel {
  const m = seedTriangle();
  change(m);
  return m;
}

describe("validateTruss", () => {
  it("returns a clean copy of a sound model, dropping fields it does not know", () => {
    const input = { ...seedTriangle(), colour: "red" };
    const clean = validateTruss(input);
    expect(clean).toEqual(seedTriangle());
    expect(clean).not.toBe(input);
    expect("colour" in clean).toBe(false);
  });

  it("accepts members that meet end to end on one line", () => {
    const m = triangleWith((t) => {
      t.joints.push({ id: "D", x: 8, y: 0 }, { id: "E", x: 6, y: 3 });
      t.members.push({ id: "BD", start: "B", end: "D" }, { id: "DE", start: "D", end: "E" }, { id: "EB", start: "E", end: "B" }, { id: "CE", start: "C", end: "E" });
    });
    expect(validateTruss(m).members).toHaveLength(7);
  });

  describe("names the first offending field", () => {
    it("for a coordinate that is not a finite number", () => {
      expect(invalidAt(triangleWith((t) => (t.joints[2].x = Number.NaN)), "joints[2].x")).toMatch(/joints\[2\]\.x must be a finite number, but it is NaN/);
      invalidAt(triangleWith((t) => (t.joints[1].y = Number.POSITIVE_INFINITY)), "joints[1].y");
    });

    it("for a load that is not a finite number", () => {
      invalidAt(triangleWith((t) => (t.loadCases[0].loads[0].fy = Number.NEGATIVE_INFINITY)), "loadCases[0].loads[0].fy");
    });

    it("for a number too large to solve with", () => {
      expect(invalidAt(triangleWith((t) => (t.joints[0].x = 1e300)), "joints[0].x")).toMatch(/larger in magnitude/);
    });

    it("for a field that is missing", () => {
      const m = seedTriangle() as unknown as { members: Record<string, unknown>[] };
      delete m.members[1].end;
      expect(invalidAt(m, "members[1].end")).toBe("members[1].end is missing.");
    });

    it("for an empty id", () => {
      invalidAt(triangleWith((t) => (t.joints[1].id = "  ")), "joints[1].id");
      invalidAt(triangleWith((t) => (t.members[0].id = "")), "members[0].id");
      invalidAt(triangleWith((t) => (t.loadCases[0].id = "")), "loadCases[0].id");
    });

    it("for ids used twice", () => {
      expect(invalidAt(triangleWith((t) => t.joints.push({ id: "B", x: 9, y: 9 })), "joints[3].id")).toMatch(/Joint id "B" is used twice/);
      invalidAt(triangleWith((t) => (t.members[2].id = "AB")), "members[2].id");
      invalidAt(triangleWith((t) => t.loadCases.push({ id: "D", loads: [] })), "loadCases[1].id");
    });

    it("for a member to a joint that does not exist", () => {
      expect(invalidAt(triangleWith((t) => (t.members[1].end = "Z")), "members[1].end")).toBe('Member BC ends at joint "Z", which does not exist.');
      invalidAt(triangleWith((t) => (t.members[2].start = "Q")), "members[2].start");
    });

    it("for a member that starts and ends at one joint", () => {
      invalidAt(triangleWith((t) => (t.members[0].end = "A")), "members[0].end");
    });

    it("for a member of zero length", () => {
      const m = triangleWith((t) => {
        t.joints.push({ id: "A2", x: 0, y: 0 });
        t.members.push({ id: "AA2", start: "A", end: "A2" });
      });
      expect(invalidAt(m, "members[3].end")).toMatch(/zero length/);
    });

    it("for two members between the same joints", () => {
      const message = invalidAt(triangleWith((t) => t.members.push({ id: "BA", start: "B", end: "A" })), "members[3]");
      expect(message).toMatch(/Members AB and BA overlap/);
    });

    it("for a member laid over part of another on the same line", () => {
      const m = triangleWith((t) => {
        t.joints.push({ id: "M", x: 2, y: 0 });
        t.members.push({ id: "MB", start: "M", end: "B" });
      });
      expect(invalidAt(m, "members[3]")).toMatch(/AB and MB overlap/);
    });

    it("for a support on a joint that does not exist", () => {
      invalidAt(triangleWith((t) => (t.supports[1].joint = "Z")), "supports[1].joint");
    });

    it("for two supports on one joint", () => {
      expect(invalidAt(triangleWith((t) => t.supports.push({ joint: "A", type: "roller" })), "supports[2].joint")).toMatch(/two supports/);
    });

    it("for a roller direction that is not a pair of numbers", () => {
      const m = seedTriangle() as unknown as { supports: { direction?: number[] }[] };
      m.supports[1].direction = [1];
      expect(invalidAt(m, "supports[1].direction")).toBe("supports[1].direction needs at least 2 entries, but it has 1.");
    });

    it("for a roller whose direction is the zero vector", () => {
      invalidAt(triangleWith((t) => (t.supports[1].direction = [0, 0])), "supports[1].direction");
    });

    it("for an unknown support type", () => {
      const m = seedTriangle() as unknown as { supports: { type: string }[] };
      m.supports[0].type = "fixed";
      expect(invalidAt(m, "supports[0].type")).toMatch(/must be one of "pin", "roller"/);
    });

    it("for an area or modulus given but not greater than zero", () => {
      expect(invalidAt(triangleWith((t) => (t.members[1].A = 0)), "members[1].A")).toMatch(/area must be greater than zero/);
      invalidAt(triangleWith((t) => (t.members[2].E = -200)), "members[2].E");
    });

    it("for a load on a joint that does not exist", () => {
      invalidAt(triangleWith((t) => t.loadCases.push({ id: "L", loads: [{ joint: "A", fx: 1 }, { joint: "Z", fy: -1 }] })), "loadCases[1].loads[1].joint");
    });

    it("for lists too short to make a truss", () => {
      expect(invalidAt(triangleWith((t) => (t.joints = [])), "joints")).toMatch(/at least 2 joints/);
      invalidAt(triangleWith((t) => (t.members = [])), "members");
      invalidAt(triangleWith((t) => (t.supports = [])), "supports");
    });

    it("for something that is not a model at all", () => {
      invalidAt(null, "model");
      invalidAt(42, "model");
      invalidAt({ joints: "many" }, "joints");
    });

    it("in reading order when several fields are wrong", () => {
      const m = triangleWith((t) => {
        t.members[2].end = "Z";
        t.supports[0].joint = "Y";
      });
      invalidAt(m, "members[2].end");
    });
  });
});
