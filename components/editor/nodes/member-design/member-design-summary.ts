import type { MemberDesignView as MemberDesignViewData } from "@/lib/calcs/member-design/member-design-view";

/** The result line: how many members pass, and the most utilized one. */
export function memberDesignSummary(view: MemberDesignViewData): string {
  if (view.rows.length === 0) return "No members checked";
  const failed = view.rows.filter((r) => !r.pass).map((r) => r.member);
  const verdict = failed.length === 0 ? `All ${view.rows.length} members PASS ✓` : `${failed.length} of ${view.rows.length} FAIL ✕ (${failed.join(", ")})`;
  const g = view.governing;
  return g ? `${verdict}; most utilized ${g.member} at ${g.utilization.toFixed(3)}` : verdict;
}
