import { texQty } from "../../latex";
import type { ResolvedUnits } from "../unit-labels";
import type { RectangleShape, TimberShape } from "./section-shape";
import type { SectionCore } from "./with-radii";

/**
 * Solid rectangle, or a timber section b × d (NDS notation, actual dressed
 * dimensions), closed form.
 */
export function rectangleProperties(s: RectangleShape | TimberShape, u: ResolvedUnits): SectionCore {
  const width = s.b;
  const depth = s.shape === "timber" ? s.d : s.h;
  const name = s.shape === "timber" ? "d" : "h";
  const A = width * depth;
  const Ix = (width * depth ** 3) / 12;
  const Iy = (depth * width ** 3) / 12;
  const what = s.shape === "timber" ? `${s.product === "glulam" ? "Glulam" : "Sawn"} timber section (actual dimensions).` : "Solid rectangle.";
  return {
    A,
    Ix,
    Iy,
    steps: [
      { latex: `A = b\\,${name} = ${texQty(width, u.length)} \\times ${texQty(depth, u.length)} = ${texQty(A, u.area)}`, text: what },
      {
        latex: `I_x = \\frac{b\\,${name}^3}{12} = ${texQty(Ix, u.inertia)},\\quad I_y = \\frac{${name}\\,b^3}{12} = ${texQty(Iy, u.inertia)}`,
        text: "Second moments of area (closed form).",
      },
    ],
  };
}
