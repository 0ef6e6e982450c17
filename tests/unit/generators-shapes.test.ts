import { describe, expect, it } from "vitest";
import { generateTruss } from "@/lib/solve/generators";
import type { TrussModel } from "@/lib/solve/types";
import { SPAN, SYMMETRIC, PANELS, allCases, equilibriumRank, jointMap, optionsFor, reactionCount } from "./generators-cases";

const TOL = 1e-9;

function segments(model: TrussModel) {
  const joints = jointMap(model);
  return model.members.map((m) => ({ id: m.id, a: joints.get(m.start)!, b: joints.get(m.end)! }));
}

type P = { x: number; y: number };
const cross = (o: P, a: P, b: P) => (a.x - o.x) * (b.y - o.y) - (a.y - o.y) * (b.x - o.x);
const same = (p: P, q: P) => Math.abs(p.x - q.x) < TOL && Math.abs(p.y - q.y) < TOL;
/** p lies on segment ab, ends excluded. */
function strictlyOn(p: P, a: P, b: P): boolean {
  if (same(p, a) || same(p, b)) return false;
  const length = Math.hypot(b.x - a.x, b.y - a.y);
  if (Math.abs(cross(a, b, p)) / length > TOL) return false;
  const t = ((p.x - a.x) * (b.x - a.x) + (p.y - a.y) * (b.y - a.y)) / (length * length);
  return t > TOL && t < 1 - TOL;
}
/** Segments cross at a point inside both (not at an end). */
function properlyCross(a: P, b: P, c: P, d: P): boolean {
  const d1 = cross(a, b, c);
  const d2 = cross(a, b, d);
  const d3 = cross(c, d, a);
  const d4 = cross(c, d, b);
  return d1 * d2 < -TOL && d3 * d4 < -TOL;
}

describe.each(allCases())("generateTruss: $name", ({ options }) => {
  // Generated per test, so a layout that throws fails its tests instead of hiding the file's.
  const generated = () => generateTruss(options);

  it("is statically determinate by count: m + r = 2j", () => {
    const { model } = generated();
    const [m, j] = [model.members.length, model.joints.length];
    expect(m + reactionCount(model)).toBe(2 * j);
  });

  it("is stable: its equilibrium matrix has full rank on the supports", () => {
    const { model } = generated();
    const j = model.joints.length;
    expect(equilibriumRank(model)).toBe(2 * j);
  });

  it("connects every joint into one piece, with at least two members at each joint", () => {
    const { model } = generated();
    const j = model.joints.length;
    const seen = new Set([model.joints[0].id]);
    const queue = [model.joints[0].id];
    while (queue.length) {
      const id = queue.pop()!;
      for (const mem of model.members) {
        const other = mem.start === id ? mem.end : mem.end === id ? mem.start : undefined;
        if (other && !seen.has(other)) {
          seen.add(other);
          queue.push(other);
        }
      }
    }
    expect(seen.size).toBe(j);
    for (const joint of model.joints) {
      expect(model.members.filter((mem) => mem.start === joint.id || mem.end === joint.id).length).toBeGreaterThanOrEqual(2);
    }
  });

  it("has no zero-length, overlapping or crossing members, and no joint inside a member", () => {
    const { model } = generated();
    const segs = segments(model);
    for (const s of segs) expect(Math.hypot(s.b.x - s.a.x, s.b.y - s.a.y)).toBeGreaterThan(TOL);
    for (const s of segs) for (const joint of model.joints) expect(strictlyOn(joint, s.a, s.b), `${joint.id} inside ${s.id}`).toBe(false);
    for (let p = 0; p < segs.length; p++) {
      for (let q = p + 1; q < segs.length; q++) {
        const [s, t] = [segs[p], segs[q]];
        expect(properlyCross(s.a, s.b, t.a, t.b), `${s.id} crosses ${t.id}`).toBe(false);
        const sameEnds = (same(s.a, t.a) && same(s.b, t.b)) || (same(s.a, t.b) && same(s.b, t.a));
        expect(sameEnds, `${s.id} duplicates ${t.id}`).toBe(false);
      }
    }
  });

  it("labels joints L/U/M with a number and members by their end joints, left (or upper) joint first", () => {
    const { model } = generated();
    const [m, j] = [model.members.length, model.joints.length];
    const joints = jointMap(model);
    expect(joints.size).toBe(j);
    expect(new Set(model.members.map((mem) => mem.id)).size).toBe(m);
    for (const joint of model.joints) expect(joint.id).toMatch(/^[LUM]\d+$/);
    for (const mem of model.members) {
      expect(mem.id).toBe(`${mem.start}${mem.end}`);
      const [a, b] = [joints.get(mem.start)!, joints.get(mem.end)!];
      if (Math.abs(a.x - b.x) < TOL) expect(a.y).toBeGreaterThan(b.y);
      else expect(a.x).toBeLessThan(b.x);
    }
  });

  it("lists bottom chord members, then top chord members, then webs, each chord left to right", () => {
    const { model, chords } = generated();
    const chordMembers = (ids: string[]) => ids.slice(1).map((id, i) => `${ids[i]}${id}`);
    const bottom = chordMembers(chords.bottom);
    const top = chordMembers(chords.top);
    expect(model.members.slice(0, bottom.length).map((mem) => mem.id)).toEqual(bottom);
    expect(model.members.slice(bottom.length, bottom.length + top.length).map((mem) => mem.id)).toEqual(top);
    const webs = model.members.slice(bottom.length + top.length).map((mem) => mem.id);
    for (const id of webs) expect([...bottom, ...top]).not.toContain(id);
  });

  it("orders each chord left to right with L joints on the bottom chord and U joints (or shared heels) on the top", () => {
    const { model, chords, panelPoints, loadedChord } = generated();
    const joints = jointMap(model);
    for (const chord of [chords.top, chords.bottom]) {
      const xs = chord.map((id) => joints.get(id)!.x);
      for (let i = 1; i < xs.length; i++) expect(xs[i]).toBeGreaterThan(xs[i - 1]);
    }
    for (const id of chords.bottom) expect(id).toMatch(/^L/);
    for (const id of chords.top.slice(1, -1)) expect(id).toMatch(/^U/);
    expect(panelPoints).toEqual(loadedChord === "top" ? chords.top : chords.bottom);
  });

  it("pins the left bottom end, puts a vertical roller on the right bottom end and leaves load cases empty", () => {
    const { model, chords } = generated();
    const joints = jointMap(model);
    const [first, last] = [chords.bottom[0], chords.bottom[chords.bottom.length - 1]];
    expect(model.supports).toEqual([
      { joint: first, type: "pin" },
      { joint: last, type: "roller" },
    ]);
    expect(joints.get(first)).toMatchObject({ x: 0, y: 0 });
    expect(joints.get(last)!.x).toBeCloseTo(SPAN, 12);
    expect(joints.get(last)!.y).toBe(0);
    expect(model.loadCases).toEqual([]);
  });
});

describe.each(SYMMETRIC.flatMap((shape) => PANELS[shape].map((n) => ({ shape, n }))))("generateTruss: $shape with $n panels is symmetric", ({ shape, n }) => {
  const mirror = (p: P) => ({ x: SPAN - p.x, y: p.y });

  it("has every joint mirrored about midspan", () => {
    const { model } = generateTruss(optionsFor(shape, n));
    for (const joint of model.joints) {
      const image = mirror(joint);
      expect(model.joints.some((other) => same(other, image)), `mirror of ${joint.id}`).toBe(true);
    }
  });

  it("has every member mirrored about midspan", () => {
    const { model } = generateTruss(optionsFor(shape, n));
    const segs = segments(model);
    for (const s of segs) {
      const [a, b] = [mirror(s.a), mirror(s.b)];
      expect(segs.some((t) => (same(t.a, a) && same(t.b, b)) || (same(t.a, b) && same(t.b, a))), `mirror of ${s.id}`).toBe(true);
    }
  });
});

describe("generateTruss: a joint's number is its panel point where chords share the panel grid", () => {
  const gridShapes = ["pratt", "howe", "warren", "warren-verticals", "k", "parallel-chord", "pratt-pitched", "howe-pitched", "scissors", "mono-pitch"] as const;
  it.each(gridShapes.flatMap((shape) => PANELS[shape].map((n) => ({ shape, n }))))("$shape with $n panels: x = index × span / panels", ({ shape, n }) => {
    const { model } = generateTruss(optionsFor(shape, n));
    for (const joint of model.joints) expect(joint.x).toBeCloseTo((Number(joint.id.slice(1)) * SPAN) / n, 9);
  });
});
