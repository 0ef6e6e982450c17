/**
 * Shared fixtures for the generator tests: one option set per shape and panel
 * count, and a few geometric helpers. Not a test file itself.
 */
import type { GenerateTrussOptions, TrussShape } from "@/lib/solve/generators";
import type { Joint, TrussModel } from "@/lib/solve/types";

export const SPAN = 24;
export const DEPTH = 3;
export const RISE = 4;

/** Panel counts tried for each shape: the smallest allowed, typical ones and a large one. */
export const PANELS: Record<TrussShape, number[]> = {
  pratt: [2, 4, 6, 8, 12],
  howe: [2, 4, 6, 8, 12],
  warren: [2, 4, 6, 8, 12],
  "warren-verticals": [2, 4, 6, 8, 12],
  k: [2, 4, 6, 8, 12],
  "parallel-chord": [2, 6, 10],
  "pratt-pitched": [2, 4, 6, 8, 12],
  "howe-pitched": [2, 4, 6, 8, 12],
  fink: [4, 6, 8, 12],
  fan: [4, 6, 8, 12],
  scissors: [2, 4, 6, 8, 12],
  "mono-pitch": [1, 2, 3, 5, 8],
};

/** Shapes that are mirror images of themselves about midspan. */
export const SYMMETRIC: TrussShape[] = (Object.keys(PANELS) as TrussShape[]).filter((s) => s !== "mono-pitch");

/** Options for `shape` with `panels`, in the geometry the shape takes (depth or rise). */
export function optionsFor(shape: TrussShape, panels: number): GenerateTrussOptions {
  switch (shape) {
    case "pratt":
    case "howe":
    case "warren":
    case "warren-verticals":
    case "k":
    case "parallel-chord":
      return { shape, span: SPAN, panels, depth: DEPTH };
    case "scissors":
      return { shape, span: SPAN, panels, rise: RISE, bottomRise: RISE / 2 };
    default:
      return { shape, span: SPAN, panels, rise: RISE };
  }
}

/** Every (shape, panels) pair plus the parallel-chord variants that only options reach. */
export function allCases(): { name: string; options: GenerateTrussOptions }[] {
  const cases = (Object.keys(PANELS) as TrussShape[]).flatMap((shape) =>
    PANELS[shape].map((n) => ({ name: `${shape} with ${n} panels`, options: optionsFor(shape, n) })),
  );
  const extras: GenerateTrussOptions[] = [
    { shape: "pratt", span: SPAN, panels: 6, depth: DEPTH, ends: "inclined" },
    { shape: "howe", span: SPAN, panels: 6, depth: DEPTH, ends: "inclined" },
    { shape: "pratt", span: SPAN, panels: 2, depth: DEPTH, ends: "inclined" },
    { shape: "parallel-chord", span: SPAN, panels: 6, depth: DEPTH, web: "howe", ends: "inclined" },
    { shape: "parallel-chord", span: SPAN, panels: 6, depth: DEPTH, web: "warren" },
    { shape: "parallel-chord", span: SPAN, panels: 6, depth: DEPTH, web: "warren-verticals" },
    { shape: "parallel-chord", span: SPAN, panels: 6, depth: DEPTH, web: "k" },
    { shape: "fink", span: SPAN, panels: 4, pitch: 0.5 },
    { shape: "mono-pitch", span: SPAN, panels: 4, pitch: 0.25 },
  ];
  return [...cases, ...extras.map((options) => ({ name: `${options.shape} ${JSON.stringify(options)}`, options }))];
}

/** The joints of `model` by id. */
export function jointMap(model: TrussModel): Map<string, Joint> {
  return new Map(model.joints.map((j) => [j.id, j]));
}

/** Number of reaction components the supports provide (pin 2, roller 1). */
export function reactionCount(model: TrussModel): number {
  return model.supports.reduce((r, s) => r + (s.type === "pin" ? 2 : 1), 0);
}

/**
 * Rank of the equilibrium matrix (2j rows: ΣFx, ΣFy at each joint; one column
 * per member force and per reaction component). Equal to m + r = 2j means the
 * truss is stable and statically determinate; this is checked independently of
 * the solver.
 */
export function equilibriumRank(model: TrussModel): number {
  const index = new Map(model.joints.map((j, i) => [j.id, i]));
  const joints = jointMap(model);
  const columns: number[][] = [];
  const column = () => new Array<number>(2 * model.joints.length).fill(0);
  for (const m of model.members) {
    const a = joints.get(m.start)!;
    const b = joints.get(m.end)!;
    const length = Math.hypot(b.x - a.x, b.y - a.y);
    const [cx, cy] = [(b.x - a.x) / length, (b.y - a.y) / length];
    const c = column();
    const ia = index.get(a.id)!;
    const ib = index.get(b.id)!;
    c[2 * ia] = cx;
    c[2 * ia + 1] = cy;
    c[2 * ib] = -cx;
    c[2 * ib + 1] = -cy;
    columns.push(c);
  }
  for (const s of model.supports) {
    const i = index.get(s.joint)!;
    const directions: [number, number][] = s.type === "pin" ? [[1, 0], [0, 1]] : [s.direction ?? [0, 1]];
    for (const [dx, dy] of directions) {
      const c = column();
      c[2 * i] = dx;
      c[2 * i + 1] = dy;
      columns.push(c);
    }
  }
  return rank(columns);
}

function rank(columns: number[][]): number {
  const rows = columns.map((c) => [...c]);
  let r = 0;
  const width = rows[0]?.length ?? 0;
  for (let col = 0; col < width && r < rows.length; col++) {
    let pivot = r;
    for (let i = r + 1; i < rows.length; i++) if (Math.abs(rows[i][col]) > Math.abs(rows[pivot][col])) pivot = i;
    if (Math.abs(rows[pivot][col]) < 1e-9) continue;
    [rows[r], rows[pivot]] = [rows[pivot], rows[r]];
    for (let i = r + 1; i < rows.length; i++) {
      const f = rows[i][col] / rows[r][col];
      for (let k = col; k < width; k++) rows[i][k] -= f * rows[r][k];
    }
    r++;
  }
  return r;
}
