import { formatNumber } from "@/components/diagrams/format-number";
import type { TrussCaseView } from "@/lib/calcs/truss/truss-view";
import { senseWord } from "./format-force";

export type MemberForcesTableProps = { caseView: TrussCaseView; unit: string };

/**
 * Member forces of one case, tension positive, each with its sense in words.
 * The force cell carries the unrounded value in `data-value` for tests and
 * for anyone copying the number out.
 */
export function MemberForcesTable({ caseView, unit }: MemberForcesTableProps) {
  return (
    <table className="pp-table" data-testid="member-forces" data-case={caseView.id}>
      <caption className="pp-label text-left">Member forces, case {caseView.id} (tension positive)</caption>
      <thead>
        <tr>
          <th scope="col">Member</th>
          <th scope="col" className="text-right">N <span className="normal-case tracking-normal text-ink-faint">({unit})</span></th>
          <th scope="col">Sense</th>
        </tr>
      </thead>
      <tbody>
        {caseView.forces.map((f) => (
          <tr key={f.member} data-member={f.member} data-sense={f.sense}>
            <th scope="row" className="pp-num font-normal">{f.member}</th>
            <td className="pp-num text-right" data-testid="force" data-value={f.force}>{formatNumber(f.force, 4)}</td>
            <td className={f.sense === "tension" ? "text-tension" : f.sense === "compression" ? "text-compression" : "text-ink-faint"}>{senseWord(f.sense)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
