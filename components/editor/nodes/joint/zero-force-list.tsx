import type { ZeroForceInspection } from "./zero-force-inspection";
import { zeroForceRuleName } from "./zero-force-inspection";

export type ZeroForceListProps = { inspection: ZeroForceInspection; caseId: string };

/** Members that carry no force by inspection, each with the rule and the joint that show it. */
export function ZeroForceList({ inspection, caseId }: ZeroForceListProps) {
  const { members, problem } = inspection;
  return (
    <section aria-label="Zero-force members by inspection" data-testid="zero-force-members">
      <h4 className="pp-label">Zero-force members by inspection, case {caseId}</h4>
      {problem && <p className="text-sm text-ink-soft">{problem}</p>}
      {!problem && members.length === 0 && <p className="text-sm text-ink-soft">None: no unloaded, unsupported joint falls under either rule.</p>}
      {members.length > 0 && (
        <ul className="space-y-1 text-sm">
          {members.map((z) => (
            <li key={z.member} data-member={z.member} data-rule={z.rule}>
              <span className="pp-num font-medium">{z.member}</span> = 0 <span className="text-ink-soft">· {zeroForceRuleName(z.rule)} ({z.joint})</span>
              <p className="text-xs text-ink-soft">{z.description}</p>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
