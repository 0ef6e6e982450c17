import { texQty } from "../../latex";
import type { Step } from "../../types";
import type { ResolvedUnits } from "../unit-labels";
import type { SectionProperties } from "./section-result";

/** What a shape computes before the radii of gyration. */
export type SectionCore = {
  A: number;
  Ix: number;
  Iy: number;
  /** Least principal second moment when the principal axes are not x and y (single angles). */
  Imin?: number;
  centroid?: { x: number; y: number };
  steps: Step[];
};

/** Adds r = √(I/A) about x, y and the minor principal axis, with their steps. */
export function withRadii(core: SectionCore, u: ResolvedUnits): SectionProperties {
  const { A, Ix, Iy } = core;
  const rx = Math.sqrt(Ix / A);
  const ry = Math.sqrt(Iy / A);
  const Imin = core.Imin ?? Math.min(Ix, Iy);
  const rmin = Math.sqrt(Imin / A);
  const steps: Step[] = [
    ...core.steps,
    {
      latex: `r_x = \\sqrt{I_x/A} = ${texQty(rx, u.length)},\\quad r_y = \\sqrt{I_y/A} = ${texQty(ry, u.length)}`,
      text: "Radii of gyration (closed form).",
    },
  ];
  if (core.Imin !== undefined) {
    steps.push({
      latex: `r_{min} = r_z = \\sqrt{I_{min}/A} = \\sqrt{${texQty(Imin, u.inertia)} / ${texQty(A, u.area)}} = ${texQty(rmin, u.length)}`,
      text: "Least radius of gyration, about the minor principal axis.",
    });
  } else {
    steps.push({ latex: `r_{min} = \\min(r_x, r_y) = ${texQty(rmin, u.length)}`, text: "x and y are the principal axes." });
  }
  return { A, Ix, Iy, rx, ry, rmin, Imin, ...(core.centroid ? { centroid: core.centroid } : {}), steps };
}
