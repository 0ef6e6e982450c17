import { formatNumber } from "@/components/diagrams/format-number";
import type { SectionCutView } from "@/lib/calcs/section-cut/section-cut-view";
import { describeAgreement } from "../truss/describe-agreement";
import { senseWord } from "../truss/format-force";
import { describeCutMethod } from "./describe-cut-method";

export type CutForcesTableProps = { view: SectionCutView };

/** Each cut member: how it was found, its force with tension or compression, and the full solution beside it. */
export function CutForcesTable({ view }: CutForcesTableProps) {
  const { force: unit, length } = view.units;
  return (
    <table className="pp-table" data-testid="cut-forces">
      <caption className="pp-label text-left">Forces in the cut members, case {view.loadCase} (tension positive)</caption>
      <thead>
        <tr>
          <th scope="col">Member</th>
          <th scope="col">Found by</th>
          <th scope="col" className="text-right">N <span className="normal-case tracking-normal text-ink-faint">({unit})</span></th>
          <th scope="col">Sense</th>
          <th scope="col">Against the full solution</th>
        </tr>
      </thead>
      <tbody>
        {view.rows.map((r) => {
          const agreement = describeAgreement(r.force, r.stiffness, r.agrees, unit);
          return (
            <tr key={r.member} data-testid="cut-force" data-member={r.member} data-value={r.force} data-sense={r.sense} data-agrees={String(r.agrees)}>
              <th scope="row" className="pp-num font-normal">{r.member}</th>
              <td>{describeCutMethod(r, length)}</td>
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
