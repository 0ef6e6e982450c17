/**
 * The shapes every part of the product exchanges with the engineering core.
 * Units are the caller's and must be consistent; tension is positive;
 * x to the right, y up; loads and reactions are global components.
 */

export type LengthUnit = "m" | "mm" | "ft" | "in";
export type ForceUnit = "kN" | "N" | "kip" | "lbf";

export type Joint = { id: string; x: number; y: number };
export type Member = { id: string; start: string; end: string; A?: number; E?: number };
/** Roller: `direction` is the line of its reaction (default [0, 1], i.e. vertical). */
export type Support = { joint: string; type: "pin" | "roller"; direction?: [number, number] };
export type JointLoad = { joint: string; fx?: number; fy?: number };
export type LoadCase = { id: string; loads: JointLoad[] };

export type TrussModel = {
  units?: { length?: LengthUnit; force?: ForceUnit };
  joints: Joint[];
  members: Member[];
  supports: Support[];
  loadCases: LoadCase[];
};

/** One line of working, typeset with KaTeX; `text` is the same line in words. */
export type Step = { latex: string; text?: string };

export type Reaction = { rx: number; ry: number };
export type Displacement = { ux: number; uy: number };

export type CaseResult = {
  reactions: Record<string, Reaction>;
  forces: Record<string, number>;
  displacements?: Record<string, Displacement>;
};

export type TrussSolution = {
  counts: { m: number; r: number; j: number };
  classification: "determinate" | "indeterminate";
  cases: Record<string, CaseResult>;
  steps?: Step[];
};
