import { texQty } from "../../latex";
import type { ResolvedUnits } from "../unit-labels";
import type { ChsShape } from "./section-shape";
import type { SectionCore } from "./with-radii";

/**
 * Circular hollow section from D and t (closed form). For AISC round HSS, pass
 * the design wall thickness (0.93 × nominal for ERW tubes, AISC 360-16 §B4.2, from memory).
 */
export function chsProperties(s: ChsShape, u: ResolvedUnits): SectionCore {
  const { D, t } = s;
  const Di = D - 2 * t;
  const A = (Math.PI * (D ** 2 - Di ** 2)) / 4;
  const I = (Math.PI * (D ** 4 - Di ** 4)) / 64;
  const steps = [
    {
      latex: `A = \\frac{\\pi}{4}\\left[D^2 - (D - 2t)^2\\right] = \\frac{\\pi}{4}\\left[${texQty(D, u.length)}^2 - ${texQty(Di, u.length)}^2\\right] = ${texQty(A, u.area)}`,
      text: "Circular hollow section area (closed form).",
    },
    {
      latex: `I_x = I_y = \\frac{\\pi}{64}\\left[D^4 - (D - 2t)^4\\right] = ${texQty(I, u.inertia)}`,
      text: "Second moment of area (closed form).",
    },
  ];
  return { A, Ix: I, Iy: I, steps };
}
