import type { ForceSense } from "../truss/truss-view";

/** A force found by the method of joints, beside the full solution's. */
export type JointForceRow = { member: string; force: number; sense: ForceSense; stiffness: number | null; agrees: boolean | null };

/** What the Joint calc shows for one joint. */
export type SingleJointView = {
  mode: "joint";
  truss: string;
  loadCase: string;
  joint: string;
  /** Members found at the joint. */
  rows: JointForceRow[];
  /** Known forces carried in. */
  known: Record<string, number>;
  /** ΣFx and ΣFy with every force in (zero when consistent). */
  residual: { x: number; y: number };
  balanced: boolean;
  agrees: boolean;
  units: { force: string };
};

/** What the Joint calc shows for a whole sequence. */
export type JointSequenceView = {
  mode: "sequence";
  truss: string;
  loadCase: string;
  /** Joints in the order solved. */
  order: string[];
  rows: JointForceRow[];
  /** Joints left over once all forces were known, each a check. */
  checks: { joint: string; balanced: boolean }[];
  complete: boolean;
  /** Why the sequence stopped early, in words. */
  stuck: string | null;
  agrees: boolean;
  units: { force: string };
};

/** What the Joint calc shows. */
export type JointView = SingleJointView | JointSequenceView;
