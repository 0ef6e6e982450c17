import { describe, expect, it } from "vitest";
import { buildScene, type BuildSceneOptions } from "@/components/diagrams/build-scene";
import { isActivationKey } from "@/components/diagrams/activation-key";
import { solveTruss, type TrussModel } from "@/lib/solve";

/** A(0,0) pin, B(4,0) roller, apex C(2,3); 10 kN down at C. */
function seedTriangle(): TrussModel {
  return {
    units: { length: "m", force: "kN" },
    joints: [{ id: "A", x: 0, y: 0 }, { id: "B", x: 4, y: 0 }, { id: "C", x: 2, y: 3 }],
    members: [{ id: "AB", start: "A", end: "B" }, { id: "BC", start: "B", end: "C" }, { id: "CA", start: "C", end: "A" }],
    supports: [{ joint: "A", type: "pin" }, { joint: "B", type: "roller" }],
    loadCases: [{ id: "D", loads: [{ joint: "C", fy: -10 }] }],
  };
}

function scene(model: TrussModel, extra: Partial<BuildSceneOptions> = {}) {
  return buildScene({
    model,
    loads: model.loadCases[0]?.loads ?? [],
    forceUnit: "kN",
    showForces: true,
    showReactions: false,
    showJointLabels: true,
    showMemberLabels: true,
    ...extra,
  });
}

describe("buildScene", () => {
  const model = seedTriangle();
  const result = solveTruss(model).cases.D;

  it("draws the tie in tension and the rafters in compression, with T and C in the labels", () => {
    const s = scene(model, { result });
    const byId = Object.fromEntries(s.members.map((m) => [m.id, m]));
    expect(byId.AB.style.sense).toBe("tension");
    expect(byId.BC.style.sense).toBe("compression");
    expect(byId.AB.label?.force).toMatch(/ T$/);
    expect(byId.CA.label?.force).toMatch(/ C$/);
    expect(byId.CA.name).toContain("compression");
    expect(s.senses).toEqual(["tension", "compression"]);
  });

  it("gives the most stressed member the widest stroke", () => {
    const s = scene(model, { result });
    const widest = s.members.reduce((w, m) => (m.style.width > w.style.width ? m : w));
    const most = Object.entries(result.forces).reduce((a, b) => (Math.abs(b[1]) > Math.abs(a[1]) ? b : a));
    expect(widest.id).toBe(most[0]);
  });

  it("skips a member whose joint is missing, and one whose ends coincide, without throwing", () => {
    const m = seedTriangle();
    m.members.push({ id: "CX", start: "C", end: "X" });
    m.joints.push({ id: "D", x: 2, y: 3 });
    m.members.push({ id: "CD", start: "C", end: "D" });
    const s = scene(m);
    expect(s.members.map((x) => x.id)).toEqual(["AB", "BC", "CA"]);
    expect(s.skippedMembers).toEqual(["CX", "CD"]);
  });

  it("ignores a joint with a half-typed coordinate", () => {
    const m = seedTriangle();
    m.joints[2] = { id: "C", x: Number.NaN, y: 3 };
    const s = scene(m);
    expect(s.joints.map((j) => j.id)).toEqual(["A", "B"]);
    expect(s.members.map((x) => x.id)).toEqual(["AB"]);
  });

  it("draws the load at C pointing down at the joint", () => {
    const s = scene(model);
    expect(s.loads).toHaveLength(1);
    const c = s.joints.find((j) => j.id === "C");
    const a = s.loads[0].path;
    expect(a.tail.y).toBeLessThan(a.tip.y);
    expect(a.tip.y).toBeLessThan(c?.at.y ?? 0);
    expect(s.loads[0].text).toBe("10 kN");
  });

  it("brings the vertical reactions up from below, clear of the support symbols", () => {
    const s = scene(model, { result, showReactions: true });
    expect(s.reactions.map((r) => r.text)).toEqual(["5 kN", "5 kN"]);
    const a = s.joints.find((j) => j.id === "A");
    const r = s.reactions.find((x) => x.joint === "A");
    expect((r?.path.tip.y ?? 0) - (a?.at.y ?? 0)).toBeCloseTo(30);
    expect(r?.path.tail.y).toBeGreaterThan(r?.path.tip.y ?? 0);
  });

  it("turns an inclined roller along its line of reaction", () => {
    const m = seedTriangle();
    m.supports[1] = { joint: "B", type: "roller", direction: [-1, 1] };
    expect(scene(m).supports[1].rotation).toBeCloseTo(-45);
  });

  it("emphasises cut members and draws a section line across them", () => {
    const s = scene(model, { cutMembers: ["AB", "BC"] });
    expect(s.members.filter((m) => m.highlighted).map((m) => m.id)).toEqual(["AB", "BC"]);
    expect(s.cutLine.length).toBeGreaterThanOrEqual(4);
  });

  it("in free-body mode fades the discarded side and points the cut forces away from the kept one", () => {
    const s = scene(model, { cutMembers: ["AB", "BC"], keptJoints: ["B"] });
    const byId = Object.fromEntries(s.members.map((m) => [m.id, m]));
    expect(byId.CA.part).toBe("faded");
    expect(byId.AB.part).toBe("cut");
    const b = s.joints.find((j) => j.id === "B");
    expect(byId.AB.keptEnd).toEqual(b?.at);
    // B is at the right; the assumed tension in AB on the free body points left, away from B.
    expect(byId.AB.cutArrow?.unit.x).toBeCloseTo(-1);
    expect(s.joints.find((j) => j.id === "C")?.faded).toBe(true);
    expect(s.loads[0].faded).toBe(true);
  });

  it("hangs a load below a bottom-chord joint when a vertical would hide it above", () => {
    const m: TrussModel = {
      joints: [{ id: "L0", x: 0, y: 0 }, { id: "L1", x: 3, y: 0 }, { id: "L2", x: 6, y: 0 }, { id: "U1", x: 3, y: 3 }],
      members: [{ id: "L0L1", start: "L0", end: "L1" }, { id: "L1L2", start: "L1", end: "L2" }, { id: "U1L1", start: "U1", end: "L1" }, { id: "L0U1", start: "L0", end: "U1" }, { id: "U1L2", start: "U1", end: "L2" }],
      supports: [{ joint: "L0", type: "pin" }, { joint: "L2", type: "roller" }],
      loadCases: [{ id: "D", loads: [{ joint: "L1", fy: -20 }] }],
    };
    const s = scene(m);
    const l1 = s.joints.find((j) => j.id === "L1");
    const [load] = s.loads;
    expect(load.pulled).toBe(true);
    expect(load.path.tail.y).toBeGreaterThan(l1?.at.y ?? 0);
    expect(load.path.tip.y).toBeGreaterThan(load.path.tail.y);
  });

  it("moves a joint label off the load arrow that occupies its usual spot", () => {
    const s = scene(model);
    const c = s.joints.find((j) => j.id === "C");
    const [load] = s.loads;
    // The arrow comes down onto C from straight above; the label must not sit on its shaft.
    const onShaft = Math.abs((c?.label?.x ?? 0) - load.path.tip.x) < 6 && (c?.label?.y ?? 0) < (c?.at.y ?? 0);
    expect(onShaft).toBe(false);
  });

  it("marks invalid members and joints", () => {
    const s = scene(model, { invalidMembers: ["BC"], invalidJoints: ["A"] });
    expect(s.members.find((m) => m.id === "BC")?.invalid).toBe(true);
    expect(s.members.find((m) => m.id === "BC")?.name).toContain("input error");
    expect(s.joints.find((j) => j.id === "A")?.invalid).toBe(true);
  });

  it("copes with an empty model", () => {
    const s = scene({ joints: [], members: [], supports: [], loadCases: [] });
    expect(s.joints).toEqual([]);
    expect(s.view.height).toBeGreaterThan(0);
  });
});

describe("isActivationKey", () => {
  it("presses a member button with Enter or Space only", () => {
    expect(isActivationKey("Enter")).toBe(true);
    expect(isActivationKey(" ")).toBe(true);
    expect(isActivationKey("a")).toBe(false);
    expect(isActivationKey("Tab")).toBe(false);
  });
});
