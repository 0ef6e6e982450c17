import type { MemberAxis } from "../geometry/member-axis";

/** A cut member seen from the kept side: its axis starts at the kept end and points across the cut. */
export type CutMember = { id: string; axis: MemberAxis };
