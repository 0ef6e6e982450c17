import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { isSolveError } from "@/lib/solve/errors";
import { solveTruss } from "@/lib/solve/truss";
import type { TrussModel } from "@/lib/solve/types";
import { seededRandom, seedStrip } from "./truss-fixtures";

/** Every number anywhere in `value`. */
function numbersIn(value: unknown): number[] {
  if (typeof value === "number") return [value];
  if (Array.isArray(value)) return value.flatMap(numbersIn);
  if (value && typeof value === "object") return Object.values(value).flatMap(numbersIn);
  return [];
}

/** Solves anything: a SolveError of kind INVALID or UNSTABLE is an answer; so is a result of finite numbers. Anything else fails. */
function solvesOrRefuses(model: unknown): "solved" | "refused" {
  let solution;
  try {
    solution = solveTruss(model as TrussModel);
  } catch (error) {
    if (isSolveError(error) && (error.code === "INVALID" || error.code === "UNSTABLE")) return "refused";
    throw error;
  }
  const bad = numbersIn(solution).filter((v) => !Number.isFinite(v));
  expect(bad).toEqual([]);
  return "solved";
}

const oddNumber = fc.oneof(
  fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, 0, -0, 1e300, -1e300, 1e-300, Number.MAX_VALUE, Number.MIN_VALUE),
  fc.double(),
);

type Mutation = (m: TrussModel, pick: (n: number) => number, odd: number) => void;

/** Ways to spoil a sound model; several may apply at once. */
const MUTATIONS: Mutation[] = [
  (m, pick, odd) => (m.joints[pick(m.joints.length)].x = odd),
  (m, pick, odd) => (m.joints[pick(m.joints.length)].y = odd),
  (m, pick) => m.joints.splice(pick(m.joints.length), 1),
  (m, pick) => m.members.splice(pick(m.members.length), 1),
  (m, pick) => (m.members[pick(m.members.length)].end = "nowhere"),
  (m, pick) => (m.members[pick(m.members.length)].end = m.members[pick(m.members.length)].start),
  (m, pick, odd) => (m.members[pick(m.members.length)].A = odd),
  (m, pick, odd) => (m.members[pick(m.members.length)].E = odd),
  (m, pick) => delete m.members[pick(m.members.length)].A,
  (m, pick) => m.members.push({ ...m.members[pick(m.members.length)], id: `dup${pick(1000)}` }),
  (m, pick) => (m.joints[pick(m.joints.length)].id = m.joints[pick(m.joints.length)].id),
  (m, pick) => (m.joints[pick(m.joints.length)] = { ...m.joints[pick(m.joints.length)], id: `twin${pick(1000)}` }),
  (m, pick, odd) => (m.supports[pick(m.supports.length)].direction = [odd, pick(3) - 1]),
  (m, pick) => (m.supports[pick(m.supports.length)].type = pick(2) ? "pin" : "roller"),
  (m, pick) => m.supports.push({ joint: m.joints[pick(m.joints.length)].id, type: "roller", direction: [pick(3) - 1, pick(3) - 1] }),
  (m, pick) => m.supports.splice(pick(m.supports.length), 1),
  (m, pick, odd) => m.loadCases[0].loads.push({ joint: m.joints[pick(m.joints.length)].id, fx: odd }),
  (m, pick) => m.loadCases[0].loads.push({ joint: `ghost${pick(9)}` }),
  (m) => (m.joints = []),
  (m) => (m.members = []),
  (m) => (m.loadCases = []),
  (m, pick) => (m.joints[pick(m.joints.length)].x = m.joints[pick(m.joints.length)].x),
];

describe("solveTruss on anything", () => {
  it("refuses junk with a SolveError and never throws anything else", () => {
    fc.assert(fc.property(fc.anything({ withNullPrototype: true, withObjectString: true }), (junk) => {
      expect(solvesOrRefuses(junk)).toBe("refused");
    }), { numRuns: 300 });
  });

  it("refuses or solves to finite numbers every spoiled model", () => {
    const outcomes = { solved: 0, refused: 0 };
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 2 ** 31 }), fc.array(fc.nat(MUTATIONS.length - 1), { maxLength: 3 }), oddNumber, (seed, which, odd) => {
        const random = seededRandom(seed);
        const model = seedStrip(random, { triangles: 1 + Math.floor(random() * 6), redundants: Math.floor(random() * 2), withoutSection: random() < 0.3, loadCases: 2 });
        const pick = (n: number) => Math.floor(random() * Math.max(1, n)) % Math.max(1, n);
        for (const k of which) {
          if (model.joints.length && model.members.length && model.supports.length && model.loadCases.length) MUTATIONS[k](model, pick, odd);
        }
        outcomes[solvesOrRefuses(model)]++;
      }),
      { numRuns: 600 },
    );
    expect(outcomes.solved).toBeGreaterThan(50);
    expect(outcomes.refused).toBeGreaterThan(50);
  });

  it("solves to finite numbers a truss with wildly different member stiffness", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 2 ** 31 }), fc.double({ min: -12, max: 12, noNaN: true }), (seed, exponent) => {
        const model = seedStrip(seededRandom(seed), { triangles: 6, redundants: 2 });
        model.members[0].E = 10 ** exponent;
        model.members[3].A = 10 ** -exponent;
        solvesOrRefuses(model);
      }),
      { numRuns: 100 },
    );
  });
});
