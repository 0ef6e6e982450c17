import type { TrussCounts } from "./describe-stability";
import type { TrussUnitLabels } from "./truss-units";

/** Tension, compression, or (within round-off) no force. */
export type ForceSense = "tension" | "compression" | "zero";

/** One member's force in one case: tension positive, in the truss's force unit. */
export type MemberForceRow = { member: string; force: number; sense: ForceSense };

/** Results of one load case, in the truss's units (displacements in mm or in). */
export type TrussCaseView = {
  id: string;
  kind: string;
  /** Total applied load per loaded joint, line loads included (for the diagram's arrows). */
  loads: { joint: string; fx: number; fy: number }[];
  reactions: { joint: string; rx: number; ry: number }[];
  forces: MemberForceRow[];
  /** Present when every member has A and E. */
  displacements?: { joint: string; ux: number; uy: number }[];
};

/** What the Truss calc shows besides its inputs. */
export type TrussView = {
  units: TrussUnitLabels;
  /** Counted from the inputs. */
  counts: TrussCounts;
  /** null when the truss could not be classified (invalid or unstable). */
  classification: "determinate" | "indeterminate" | null;
  stable: boolean;
  /** Determinacy and stability in words. */
  stability: string;
  cases: TrussCaseView[];
};
