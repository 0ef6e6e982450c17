import type { CheckProgress } from "./compute-check-progress";

export type DescribeUnfinishedCheckOptions = { progress: CheckProgress };

/** Why a package cannot be issued yet, in words an engineer can act on: which calcs, how many remarks. */
export function describeUnfinishedCheck({ progress }: DescribeUnfinishedCheckOptions): string {
  const reasons: string[] = [];
  const notChecked = progress.calcs.filter((c) => c.state !== "checked");
  if (notChecked.length > 0) {
    const list = notChecked.map((c) => `${c.label} (${c.state === "returned" ? "returned" : c.cleared ? "inputs changed since it was checked" : "unchecked"})`).join(", ");
    reasons.push(`${notChecked.length} of ${progress.total} calcs not checked: ${list}`);
  }
  if (progress.openRemarks > 0) reasons.push(`${progress.openRemarks} remark${progress.openRemarks === 1 ? " is" : "s are"} still open`);
  return `${reasons.join("; ")}.`;
}
