import type { TrussCaseView } from "@/lib/calcs/truss/truss-view";
import { formatNumber } from "@/components/diagrams/format-number";

export type ReactionsTableProps = { caseView: TrussCaseView; unit: string };

/** Support reactions of one case, global components (x to the right, y up). */
export function ReactionsTable({ caseView, unit }: ReactionsTableProps) {
  return (
    <table className="pp-table" data-testid="reactions" data-case={caseView.id}>
      <caption className="pp-label text-left">Reactions, case {caseView.id}</caption>
      <thead>
        <tr>
          <th scope="col">Support</th>
          <th scope="col" className="text-right">Rx <span className="normal-case tracking-normal text-ink-faint">({unit})</span></th>
          <th scope="col" className="text-right">Ry <span className="normal-case tracking-normal text-ink-faint">({unit})</span></th>
        </tr>
      </thead>
      <tbody>
        {caseView.reactions.map((r) => (
          <tr key={r.joint} data-joint={r.joint}>
            <th scope="row" className="pp-num font-normal">{r.joint}</th>
            <td className="pp-num text-right">{formatNumber(r.rx, 4)}</td>
            <td className="pp-num text-right">{formatNumber(r.ry, 4)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
