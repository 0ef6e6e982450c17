import { formatNumber } from "@/components/diagrams/format-number";
import type { JointForceRow } from "@/lib/calcs/joint/joint-view";
import { describeAgreement } from "../truss/describe-agreement";
import { senseWord } from "../truss/format-force";

export type JointForcesTableProps = { rows: readonly JointForceRow[]; unit: string; caption: string };

/** The member forces found by the method of joints, with tension or compression and the full solution beside each. */
export function JointForcesTable({ rows, unit, caption }: JointForcesTableProps) {
  return (
    <table className="pp-table" data-testid="joint-forces">
      <caption className="pp-label text-left">{caption}</caption>
      <thead>
        <tr>
          <th scope="col">Member</th>
          <th scope="col" className="text-right">N <span className="normal-case tracking-normal text-ink-faint">({unit})</span></th>
          <th scope="col">Sense</th>
          <th scope="col">Against the full solution</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => {
          const agreement = describeAgreement(r.force, r.stiffness, r.agrees, unit);
          return (
            <tr key={r.member} data-testid="joint-force" data-member={r.member} data-value={r.force} data-sense={r.sense} data-agrees={String(r.agrees)}>
              <th scope="row" className="pp-num font-normal">{r.member}</th>
              <td className="pp-num text-right" data-testid="force" data-value={r.force}>{formatNumber(r.force, 4)}</td>
              <td className={r.sense === "tension" ? "text-tension" : r.sense === "compression" ? "text-compression" : "text-ink-faint"}>{senseWord(r.sense)}</td>
              <td className={agreement.ok === false ? "font-medium text-compression" : "text-ink-soft"}>{agreement.text}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
