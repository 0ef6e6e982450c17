import { formatNumber } from "@/components/diagrams/format-number";
import type { JointView } from "@/lib/calcs/joint/joint-view";

export type JointOutcomeProps = { view: JointView };

/**
 * The verdict in words: for one joint, whether it balances with every force
 * in and agrees with the full solution; for a sequence, the order, the joints
 * left as checks, and where it stopped if it did.
 */
export function JointOutcome({ view }: JointOutcomeProps) {
  const agree = view.agrees ? `✓ Agrees with the stiffness solution of ${view.truss} within round-off.` : `✕ Differs from the stiffness solution of ${view.truss}; see the table.`;
  if (view.mode === "joint") {
    const { x, y } = view.residual;
    return (
      <div className="space-y-0.5 text-sm" data-testid="joint-outcome" data-agrees={String(view.agrees)}>
        <p className={view.balanced ? undefined : "font-medium text-compression"}>
          {view.balanced
            ? `✓ Joint ${view.joint} balances: ΣFx = ΣFy = 0 with every force in.`
            : `✕ Joint ${view.joint} does not balance with the known forces: ΣFx = ${formatNumber(x, 4)} ${view.units.force}, ΣFy = ${formatNumber(y, 4)} ${view.units.force}.`}
        </p>
        <p className={view.agrees ? undefined : "font-medium text-compression"}>{agree}</p>
      </div>
    );
  }
  const unbalanced = view.checks.filter((c) => !c.balanced).map((c) => c.joint);
  return (
    <div className="space-y-0.5 text-sm" data-testid="joint-outcome" data-agrees={String(view.agrees)}>
      <p>
        Solved in order: <span className="pp-num">{view.order.join(" → ")}</span>
      </p>
      {view.checks.length > 0 && (
        <p className={unbalanced.length > 0 ? "font-medium text-compression" : undefined}>
          {unbalanced.length > 0 ? `✕ Check joints that do not balance: ${unbalanced.join(", ")}.` : `✓ Check joints balance: ${view.checks.map((c) => c.joint).join(", ")}.`}
        </p>
      )}
      {view.stuck && <p className="font-medium text-caution">△ Stopped early: {view.stuck}</p>}
      <p className={view.agrees ? undefined : "font-medium text-compression"}>{agree}</p>
    </div>
  );
}
