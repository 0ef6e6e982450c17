import { texQty } from "../../latex";
import type { ResolvedUnits } from "../unit-labels";
import { rectangleSum, type Rect } from "./rectangle-sum";
import type { DoubleAngleShape } from "./section-shape";
import type { SectionCore } from "./with-radii";

/**
 * Two angles, `d` legs back to back `gap` apart; the pair is symmetric about
 * y, so x and y are principal. Acting as one member needs connectors close
 * enough that a single angle between them does not govern (AISC 360-16 §E6);
 * flexural-torsional buckling (§E4) is not covered by r alone.
 */
export function doubleAngleProperties(s: DoubleAngleShape, u: ResolvedUnits): SectionCore {
  const { d, b, t, gap } = s;
  const g = gap / 2;
  const right: Rect[] = [
    { x0: g, x1: g + b, y0: 0, y1: t },
    { x0: g, x1: g + t, y0: t, y1: d },
  ];
  const left: Rect[] = right.map((r) => ({ x0: -r.x1, x1: -r.x0, y0: r.y0, y1: r.y1 }));
  const sum = rectangleSum([...right, ...left]);
  const steps = [
    {
      latex: `A = 2(b + d - t)\\,t = ${texQty(sum.A, u.area)},\\quad \\bar y = ${texQty(sum.yBar, u.length)}`,
      text: "Two angles, legs as rectangles (root and toe radii ignored); centroid above the underside.",
    },
    {
      latex: `I_x = ${texQty(sum.Ix, u.inertia)},\\quad I_y = ${texQty(sum.Iy, u.inertia)}\\quad (\\text{gap } ${texQty(gap, u.length)})`,
      text: "Second moments about the centroidal axes (parallel-axis theorem); y is the axis of symmetry.",
    },
  ];
  return { A: sum.A, Ix: sum.Ix, Iy: sum.Iy, centroid: { x: 0, y: sum.yBar }, steps };
}
