import type { Step } from "../types";
import type { BucklingCurve } from "./en1993-imperfection-factors";
import type { NdsColumnParameter } from "./nds-column-stability";
import type { SectionShape } from "./shapes/section-shape";
import type { UnitsOption } from "./unit-labels";

/** A section entered by its properties rather than its shape. */
export type SectionByProperties = {
  shape: "properties";
  /** Gross area. */
  A: number;
  /** Least radius of gyration (about the axis the member buckles about). */
  rmin: number;
  /** Least cross-section dimension, needed for timber (le/d, NDS 2018 §3.7.1). */
  d?: number;
};

/** A member's section: dimensions of a common shape, or properties. */
export type MemberSection = SectionShape | SectionByProperties;

/** What every member check takes. Units consistent with the material's stresses. */
export type CheckMemberCommon = {
  /** Axial force, tension positive: factored for LRFD and EN 1993, service level for ASD. */
  force: number;
  section: MemberSection;
  /** Unbraced length for buckling (≥ 0). */
  length: number;
  /** Effective length factor, default 1.0 (pin-ended truss member). */
  K?: number;
  units?: UnitsOption;
};

/** Steel to AISC 360-16 chapters D and E (default labels kip, in, ksi). */
export type CheckAisc360Member = CheckMemberCommon & {
  material: "steel-aisc360";
  Fy: number;
  Fu: number;
  E: number;
  /** Net area; default the gross area (no holes). */
  An?: number;
  /** Shear lag factor, Table D3.1; default 1.0. */
  U?: number;
  /** LRFD (φ) or ASD (Ω); default LRFD. */
  method?: "LRFD" | "ASD";
};

/** Steel to EN 1993-1-1 §6.2.3 and §6.3.1 (default labels N, mm, MPa). */
export type CheckEn1993Member = CheckMemberCommon & {
  material: "steel-en1993";
  fy: number;
  fu: number;
  E: number;
  /** Net area at fastener holes; default the gross area. */
  Anet?: number;
  curve: BucklingCurve;
  gammaM0?: number;
  gammaM1?: number;
  gammaM2?: number;
};

/**
 * Timber to NDS 2018 §3.6–3.8 (default labels lbf, in, psi). The design
 * values carry their adjustment factors already, so ASD or LRFD follows from
 * them.
 */
export type CheckNdsMember = CheckMemberCommon & {
  material: "timber-nds";
  /** Fc*: Fc times every adjustment factor except Cp. */
  FcStar: number;
  /** F't: adjusted tension design value parallel to grain. */
  FtPrime: number;
  /** E'min: adjusted modulus for stability. */
  EminPrime: number;
  c: NdsColumnParameter;
  /** Net area for tension (§3.8.1); default the gross area. */
  An?: number;
};

/** Options of `checkMember`, one shape per material. */
export type CheckMemberOptions = CheckAisc360Member | CheckEn1993Member | CheckNdsMember;

/** The outcome of a member check. */
export type CheckMemberResult = {
  mode: "tension" | "compression";
  /** |force|. */
  demand: number;
  /** Design (or allowable) strength in the mode. */
  capacity: number;
  /** demand / capacity. */
  utilization: number;
  /** utilization ≤ 1.0. */
  pass: boolean;
  /** Clause and limit state that set the capacity, e.g. "AISC 360-16 §E3, Eq. E3-2 (flexural buckling)". */
  governs: string;
  /** KL/r (steel) or le/d (timber) for compression, L/r for steel in tension. */
  slenderness: number;
  warnings: string[];
  steps: Step[];
};
