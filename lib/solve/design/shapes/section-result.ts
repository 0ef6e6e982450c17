import type { Step } from "../../types";

/**
 * Cross-section properties about centroidal axes x (horizontal) and y
 * (vertical), in the shape's length unit (area L², second moments L⁴).
 */
export type SectionProperties = {
  A: number;
  Ix: number;
  Iy: number;
  rx: number;
  ry: number;
  /** Least radius of gyration, about the minor principal axis (rz for single angles). */
  rmin: number;
  /** Least principal second moment of area. */
  Imin: number;
  /** Centroid from the back of the vertical leg / web (x) and the underside (y), for angles and channels. */
  centroid?: { x: number; y: number };
  steps: Step[];
};
