import type { ExternalForce, PivotKind, Point } from "../../solve";
import type { ForceSense } from "../truss/truss-view";

/** One cut member: its force by the section, how it was found, and the stiffness solution beside it. */
export type CutMemberRow = {
  member: string;
  /** Tension positive, in the truss's force unit. */
  force: number;
  sense: ForceSense;
  /** "moment" about `pivot`, or "force sum" across two parallel members. */
  method: "moment" | "force sum";
  pivot: Point | null;
  pivotKind: PivotKind | null;
  /** The full solution's force, when available. */
  stiffness: number | null;
  agrees: boolean | null;
};

/** What the Section cut calc shows. */
export type SectionCutView = {
  truss: string;
  loadCase: string;
  /** The members cut, and whether they were proposed (no members entered). */
  members: string[];
  proposed: boolean;
  /** Words describing the proposed cut, when one was proposed. */
  description: string | null;
  keep: string;
  keptJoints: string[];
  externalForces: ExternalForce[];
  rows: CutMemberRow[];
  /** True when every cut force agrees with the full solution. */
  agrees: boolean;
  units: { force: string; length: string };
};
