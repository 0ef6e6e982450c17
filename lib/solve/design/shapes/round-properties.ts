import { texQty } from "../../latex";
import type { ResolvedUnits } from "../unit-labels";
import type { RoundShape } from "./section-shape";
import type { SectionCore } from "./with-radii";

/** Solid round bar (closed form). */
export function roundProperties(s: RoundShape, u: ResolvedUnits): SectionCore {
  const { D } = s;
  const A = (Math.PI * D ** 2) / 4;
  const I = (Math.PI * D ** 4) / 64;
  return {
    A,
    Ix: I,
    Iy: I,
    steps: [
      { latex: `A = \\frac{\\pi D^2}{4} = \\frac{\\pi \\times ${texQty(D, u.length)}^2}{4} = ${texQty(A, u.area)}`, text: "Solid round area." },
      { latex: `I_x = I_y = \\frac{\\pi D^4}{64} = ${texQty(I, u.inertia)}`, text: "Second moment of area." },
    ],
  };
}
