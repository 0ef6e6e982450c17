/** One member's check, in the truss's force and length units. */
export type MemberCheckRow = {
  member: string;
  /** Length between its joints. */
  length: number;
  /** The governing axial force, tension positive. */
  force: number;
  /** The combination or load case that gives it. */
  combination: string;
  mode: "tension" | "compression";
  /** |force|. */
  demand: number;
  /** Design (or allowable) strength in that mode. */
  capacity: number;
  /** demand / capacity. */
  utilization: number;
  /** utilization ≤ 1.0. */
  pass: boolean;
  /** Clause and limit state that set the capacity. */
  governs: string;
  /** KL/r (steel) or le/d (timber). */
  slenderness: number;
  warnings: string[];
};

/** What the Member design calc shows. */
export type MemberDesignView = {
  truss: string;
  material: "steel-aisc360" | "steel-en1993" | "timber-nds";
  /** "combinations C1" or "load case G", in words. */
  source: string;
  rows: MemberCheckRow[];
  /** The most utilized member, or null when no rows. */
  governing: { member: string; utilization: number } | null;
  /** Truss units (force, length) for the table, and the design units the working is in. */
  units: { force: string; length: string; design: { force: string; length: string; stress: string } };
};
