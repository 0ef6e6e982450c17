/** The moments of the review that someone must hear about by e-mail. */
export type ReviewEvent =
  | { kind: "submitted"; packageId: string; actorId: string }
  | { kind: "remark.raised"; packageId: string; remarkId: string; actorId: string }
  | { kind: "remark.answered"; packageId: string; remarkId: string; actorId: string }
  | { kind: "checked"; packageId: string; actorId: string }
  | { kind: "issued"; packageId: string; revisionId: string; actorId: string };
