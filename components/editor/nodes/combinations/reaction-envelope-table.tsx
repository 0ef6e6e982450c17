import type { CombinationsView as CombinationsViewData } from "@/lib/calcs/combinations/combinations-view";
import { formatFigure } from "./format-figure";

export type ReactionEnvelopeTableProps = {
  reactions: CombinationsViewData["reactions"];
  force: string;
};

/** The governing combination of each support reaction component, for the bearing design. */
export function ReactionEnvelopeTable({ reactions, force }: ReactionEnvelopeTableProps) {
  if (reactions.length === 0) return null;
  return (
    <table className="pp-table" aria-label="Governing combination per support reaction">
      <thead>
        <tr>
          <th scope="col">Support</th>
          <th scope="col" className="text-right">
            Max <span className="normal-case tracking-normal text-ink-faint">({force})</span>
          </th>
          <th scope="col">by</th>
          <th scope="col" className="text-right">
            Min <span className="normal-case tracking-normal text-ink-faint">({force})</span>
          </th>
          <th scope="col">by</th>
        </tr>
      </thead>
      <tbody>
        {reactions.map((r) => (
          <tr key={`${r.joint}-${r.component}`}>
            <th scope="row" className="pp-num text-left font-normal">
              R<sub>{r.component}</sub> {r.joint}
            </th>
            <td className="pp-num text-right">{formatFigure(r.max.value)}</td>
            <td className="text-xs text-ink-soft">{r.max.combination}</td>
            <td className="pp-num text-right">{formatFigure(r.min.value)}</td>
            <td className="text-xs text-ink-soft">{r.min.combination}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
