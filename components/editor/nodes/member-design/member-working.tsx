import { StepList } from "@/components/math/step-list";
import type { MemberCheckRow } from "@/lib/calcs/member-design/member-design-view";
import type { Step } from "@/lib/solve";
import { stepsByMember } from "./member-steps";

export type MemberWorkingProps = { steps: readonly Step[]; rows: readonly MemberCheckRow[] };

/** The working of each member on its own, collapsed to its last step (the utilization) until the reader opens it. */
export function MemberWorking({ steps, rows }: MemberWorkingProps) {
  const byMember = stepsByMember(steps, rows.map((r) => r.member));
  if (rows.length === 0) return null;
  return (
    <section aria-label="Working per member" className="space-y-3">
      <h4 className="pp-label">Working per member</h4>
      {rows.map((r) => {
        const own = byMember.get(r.member) ?? [];
        if (own.length === 0) return null;
        return (
          <div key={r.member} className="border-l-2 border-rule pl-3">
            <h5 className="mb-1 text-sm">
              Member <span className="pp-num font-semibold">{r.member}</span>
              <span className="text-ink-soft">
                {" "}
                · {r.mode} · utilization <span className="pp-num">{r.utilization.toFixed(3)}</span> {r.pass ? "✓" : "✕"}
              </span>
            </h5>
            <StepList steps={own} defaultCollapsed />
          </div>
        );
      })}
    </section>
  );
}
