import { describe, expect, it } from "vitest";
import { draftModel } from "@/components/editor/nodes/truss/draft-model";
import { invalidParts } from "@/components/editor/nodes/truss/invalid-parts";
import { readTrussDraft } from "@/components/editor/nodes/truss/truss-draft";
import { trussTabErrors } from "@/components/editor/nodes/truss/truss-tab-errors";
import { demoFootbridgeTruss } from "@/lib/document/demo-footbridge-truss";

describe("readTrussDraft", () => {
  it("keeps every value of valid inputs", () => {
    const inputs = demoFootbridgeTruss();
    const draft = readTrussDraft(inputs);
    expect(draft.joints).toHaveLength(12);
    expect(draft.members[0]).toMatchObject({ id: "L0L1", start: "L0", end: "L1", E: 210 });
    expect(draft.lineLoads?.[1]).toMatchObject({ case: "Q", w: 6.25, projected: true });
    expect(draft.generator?.shape).toBe("pratt");
  });

  it("reads a half-typed truss without throwing: missing numbers stay missing", () => {
    const draft = readTrussDraft({ joints: [{ id: "A" }, { id: 3, x: "2", y: 1 }], members: "junk", units: { length: "yard" } });
    expect(draft.joints).toEqual([{ id: "A", x: undefined, y: undefined }, { id: "3", x: undefined, y: 1 }]);
    expect(draft.members).toEqual([]);
    expect(draft.units).toEqual({ length: "m", force: "kN" });
  });

  it("reads nothing at all as an empty truss in SI", () => {
    expect(readTrussDraft(null)).toEqual({ units: { length: "m", force: "kN" }, joints: [], members: [], supports: [], loadCases: [] });
  });
});

describe("invalidParts", () => {
  const draft = readTrussDraft(demoFootbridgeTruss());

  it("marks the member whose end is wrong, not a joint", () => {
    expect(invalidParts([{ path: "members[3].end", message: "ends at a joint that does not exist" }], draft)).toEqual({ joints: [], members: ["L3L4"] });
  });

  it("marks a joint for its own row, its support and a load put on it", () => {
    const marked = invalidParts(
      [
        { path: "joints[2].x", message: "must be a finite number" },
        { path: "supports[1].direction", message: "zero direction" },
        { path: "loadCases[0].loads[0].joint", message: "no such joint" },
      ],
      { ...draft, loadCases: [{ id: "G", kind: "G", loads: [{ joint: "U9", fy: -1 }] }] },
    );
    expect(marked.joints).toEqual(["L2", "L6", "U9"]);
  });
});

describe("trussTabErrors", () => {
  it("counts errors on the tab that shows their field and keeps the rest for a list", () => {
    const sorted = trussTabErrors([
      { path: "members[3].end", message: "a" },
      { path: "loadCases[1].loads[0].fy", message: "b" },
      { path: "lineLoads[0].chord[2]", message: "c" },
      { path: "supports[1].direction", message: "d" },
      { path: "supports", message: "needs at least 1 entry" },
    ]);
    expect(sorted.counts).toEqual({ joints: 0, members: 1, supports: 1, loads: 2, generator: 0 });
    expect(sorted.loose).toEqual([{ path: "supports", message: "needs at least 1 entry" }]);
  });
});

describe("draftModel", () => {
  it("draws joints with both coordinates and every member, with joint loads but not yet line loads", () => {
    const model = draftModel({
      units: { length: "ft", force: "kip" },
      joints: [{ id: "A", x: 0, y: 0 }, { id: "B", x: 10 }],
      members: [{ id: "AB", start: "A", end: "B" }],
      supports: [{ joint: "A", type: "pin" }],
      loadCases: [{ id: "D", kind: "D", loads: [{ joint: "A", fy: -2 }] }],
      lineLoads: [{ case: "D", chord: ["A", "B"], w: 1 }],
    });
    expect(model.joints).toEqual([{ id: "A", x: 0, y: 0 }]);
    expect(model.members).toHaveLength(1);
    expect(model.loadCases[0].loads).toEqual([{ joint: "A", fx: 0, fy: -2 }]);
    expect(model.units).toEqual({ length: "ft", force: "kip" });
  });
});
