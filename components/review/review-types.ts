import type { CalcCheckState, CheckProgress } from "@/lib/review/compute-check-progress";
import type { RemarkThread } from "@/lib/review/list-remarks";

/** What JSON makes of the server's types: dates arrive as ISO strings. */
type Wire<T> = { [K in keyof T]: T[K] extends Date ? string : T[K] extends Date | null ? string | null : T[K] extends (infer U)[] ? Wire<U>[] : T[K] };

export type CalcCheckDto = Wire<CalcCheckState>;
export type CheckProgressDto = Omit<Wire<CheckProgress>, "calcs"> & { calcs: CalcCheckDto[] };
export type RemarkDto = Wire<RemarkThread>;

/** Where a new remark goes: a calc, quoted words, or the package as a whole. */
export type RemarkTarget = { kind: "calc"; calcId: string; label: string } | { kind: "text"; from: number; to: number; quote: string } | { kind: "package" };

/** What the signed-in person may do in the review, decided on the server from their project role. */
export type ReviewAbilities = {
  userId: string;
  canRemark: boolean;
  canReply: boolean;
  /** Project engineer: may close any remark. Others close only remarks they opened, when they hold remark.close. */
  canCloseAny: boolean;
  canCloseOwn: boolean;
  canCheck: boolean;
  canSubmit: boolean;
  canAssign: boolean;
  canIssue: boolean;
  canStartNext: boolean;
};

export type CheckerChoice = { userId: string; name: string };
