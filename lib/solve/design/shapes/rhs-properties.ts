import { texQty } from "../../latex";
import type { ResolvedUnits } from "../unit-labels";
import { roundedRectangle } from "./rounded-rectangle";
import type { RhsShape } from "./section-shape";
import type { SectionCore } from "./with-radii";

/**
 * Rectangular hollow section as outer less inner rounded rectangle. With no
 * corner radius the corners are sharp (A and I slightly high against tables);
 * with an outside radius ro the inside radius is max(ro − t, 0). AISC tables
 * use ro = 2t on the design thickness 0.93 t (AISC 360-16 §B4.2, from memory).
 */
export function rhsProperties(s: RhsShape, u: ResolvedUnits): SectionCore {
  const { b, h, t } = s;
  const ro = s.cornerRadius ?? 0;
  const ri = Math.max(ro - t, 0);
  const outer = roundedRectangle(b, h, ro);
  const inner = roundedRectangle(b - 2 * t, h - 2 * t, ri);
  const A = outer.A - inner.A;
  const Ix = outer.Ix - inner.Ix;
  const Iy = outer.Iy - inner.Iy;
  const steps =
    ro === 0
      ? [
          {
            latex: `A = bh - (b - 2t)(h - 2t) = ${texQty(A, u.area)}`,
            text: "Rectangular hollow section with sharp corners (corner radius ignored).",
          },
          {
            latex: `I_x = \\frac{bh^3 - (b - 2t)(h - 2t)^3}{12} = ${texQty(Ix, u.inertia)},\\quad I_y = \\frac{hb^3 - (h - 2t)(b - 2t)^3}{12} = ${texQty(Iy, u.inertia)}`,
            text: "Second moments of area (closed form).",
          },
        ]
      : [
          {
            latex: `A = \\left[bh - (4 - \\pi) r_o^2\\right] - \\left[(b - 2t)(h - 2t) - (4 - \\pi) r_i^2\\right] = ${texQty(A, u.area)}\\quad (r_o = ${texQty(ro, u.length)},\\ r_i = ${texQty(ri, u.length)})`,
            text: "Rectangular hollow section with rounded corners: outer less inner rounded rectangle.",
          },
          {
            latex: `I_x = ${texQty(Ix, u.inertia)},\\quad I_y = ${texQty(Iy, u.inertia)}`,
            text: "Second moments: rectangles less the four corner spandrels (parallel-axis theorem).",
          },
        ];
  return { A, Ix, Iy, steps };
}
