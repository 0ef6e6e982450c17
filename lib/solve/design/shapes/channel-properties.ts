import { texQty } from "../../latex";
import type { ResolvedUnits } from "../unit-labels";
import { rectangleSum } from "./rectangle-sum";
import type { ChannelShape } from "./section-shape";
import type { SectionCore } from "./with-radii";

/**
 * Channel with parallel flanges of constant thickness; flange taper and fillet
 * radii are ignored, so rolled tapered-flange channels differ a little from
 * their tabulated values.
 */
export function channelProperties(s: ChannelShape, u: ResolvedUnits): SectionCore {
  const { d, bf, tf, tw } = s;
  const sum = rectangleSum([
    { x0: 0, x1: tw, y0: 0, y1: d },
    { x0: tw, x1: bf, y0: 0, y1: tf },
    { x0: tw, x1: bf, y0: d - tf, y1: d },
  ]);
  const steps = [
    {
      latex: `A = 2 b_f t_f + (d - 2t_f)\\,t_w = ${texQty(sum.A, u.area)},\\quad \\bar x = ${texQty(sum.xBar, u.length)}`,
      text: "Channel area; centroid from the back of the web (flange taper and radii ignored).",
    },
    {
      latex: `I_x = \\frac{b_f d^3 - (b_f - t_w)(d - 2t_f)^3}{12} = ${texQty(sum.Ix, u.inertia)},\\quad I_y = ${texQty(sum.Iy, u.inertia)}`,
      text: "Second moments about the centroidal axes (parallel-axis theorem for Iy).",
    },
  ];
  return { A: sum.A, Ix: sum.Ix, Iy: sum.Iy, centroid: { x: sum.xBar, y: d / 2 }, steps };
}
