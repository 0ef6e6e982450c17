/**
 * Shapes shared by the hand methods (sections, joints, virtual work): points,
 * lines of action, what a moment point is, and how a hand result compares
 * with the stiffness solution.
 */

/** A point in the model's length unit (x to the right, y up). */
export type Point = { x: number; y: number };

/** A line of action: a point on it and a unit direction along it. */
export type Line = { point: Point; direction: Point };

/**
 * What a moment point is, so the working can say it in words: a joint of the
 * truss (named), a supported joint (named), or a point in the plane that is
 * not a joint (where two lines of action meet outside the truss, say).
 */
export type PivotKind =
  | { kind: "joint"; joint: string }
  | { kind: "support"; joint: string }
  | { kind: "off-truss point" };

/** One hand-method value set beside the stiffness solution's value for the same quantity. */
export type Comparison = {
  /** Value found by the hand method (sections, joints, virtual work). */
  method: number;
  /** Value from the global stiffness solution. */
  stiffness: number;
  /** `method - stiffness`. */
  difference: number;
  /** True when the difference is round-off only (relative 1e-6). */
  agrees: boolean;
};

/** A load or a support reaction acting at a joint of a free body, in global components. */
export type ExternalForce = {
  joint: string;
  kind: "load" | "reaction";
  fx: number;
  fy: number;
};

/** The model's units with the product defaults filled in (kN, m). */
export type ModelUnits = { length: string; force: string; moment: string };
