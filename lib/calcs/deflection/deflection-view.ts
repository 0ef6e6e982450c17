/** What the Deflection calc shows. Deflections in mm (SI) or in (US); span in the truss's length unit. */
export type DeflectionView = {
  truss: string;
  loadCase: string;
  joint: string;
  direction: "x" | "y";
  /** Deflection along +direction (negative: down or to the left). */
  value: number;
  /** "downward", "upward", "to the left", "to the right" or "none". */
  sense: string;
  /** The stiffness solution's displacement, for the cross-check; null when not available. */
  stiffnessValue: number | null;
  agrees: boolean | null;
  span: number;
  ratio: number;
  allowable: number;
  utilization: number;
  pass: boolean;
  /** The virtual-work table, in the model's consistent units (see `units.model`). */
  terms: { member: string; N: number; n: number; L: number; contribution: number }[];
  units: { deflection: string; length: string; force: string };
};
