import { texNum, texQty } from "../../latex";
import type { ResolvedUnits } from "../unit-labels";
import { rectangleSum } from "./rectangle-sum";
import type { AngleShape } from "./section-shape";
import type { SectionCore } from "./with-radii";

/**
 * Single angle as two rectangles (the horizontal leg full width, the vertical
 * leg above it); root and toe radii are ignored, so A is slightly low and the
 * minor-axis values slightly off against rolled-section tables.
 */
export function angleProperties(s: AngleShape, u: ResolvedUnits): SectionCore {
  const { d, b, t } = s;
  const sum = rectangleSum([
    { x0: 0, x1: b, y0: 0, y1: t },
    { x0: 0, x1: t, y0: t, y1: d },
  ]);
  const mean = (sum.Ix + sum.Iy) / 2;
  const radius = Math.sqrt(((sum.Ix - sum.Iy) / 2) ** 2 + sum.Ixy ** 2);
  const Imin = mean - radius;
  const Imax = mean + radius;
  // Angle of the major principal axis from x; tan 2θ = −2Ixy/(Ix − Iy) (Mohr's circle).
  const theta = (0.5 * Math.atan2(-2 * sum.Ixy, sum.Ix - sum.Iy) * 180) / Math.PI;
  const steps = [
    {
      latex: `A = (b + d - t)\\,t = (${texQty(b, u.length)} + ${texQty(d, u.length)} - ${texQty(t, u.length)}) \\times ${texQty(t, u.length)} = ${texQty(sum.A, u.area)}`,
      text: "Angle area, legs as rectangles (root and toe radii ignored).",
    },
    {
      latex: `\\bar x = ${texQty(sum.xBar, u.length)},\\quad \\bar y = ${texQty(sum.yBar, u.length)}`,
      text: "Centroid from the back of the vertical leg and the underside of the horizontal leg.",
    },
    {
      latex: `I_x = ${texQty(sum.Ix, u.inertia)},\\quad I_y = ${texQty(sum.Iy, u.inertia)},\\quad I_{xy} = ${texQty(sum.Ixy, u.inertia)}`,
      text: "Second moments about centroidal axes parallel to the legs (parallel-axis theorem).",
    },
    {
      latex: `I_{max,min} = \\frac{I_x + I_y}{2} \\pm \\sqrt{\\left(\\frac{I_x - I_y}{2}\\right)^2 + I_{xy}^2} = ${texQty(Imax, u.inertia)},\\ ${texQty(Imin, u.inertia)}\\quad (\\theta = ${texNum(theta)}^\\circ)`,
      text: "Principal second moments (Mohr's circle); the minor axis z governs flexural buckling of a single angle.",
    },
  ];
  return { A: sum.A, Ix: sum.Ix, Iy: sum.Iy, Imin, centroid: { x: sum.xBar, y: sum.yBar }, steps };
}
