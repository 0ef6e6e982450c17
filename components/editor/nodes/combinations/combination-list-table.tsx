import type { CombinationsView as CombinationsViewData } from "@/lib/calcs/combinations/combinations-view";
import { formatFigure } from "./format-figure";

export type CombinationListTableProps = {
  combinations: CombinationsViewData["combinations"];
  caseIds: readonly string[];
};

/** Every combination applied: its name, the factor on each case (blank where it is left out) and where the factors come from. */
export function CombinationListTable({ combinations, caseIds }: CombinationListTableProps) {
  if (combinations.length === 0) return null;
  return (
    <div className="overflow-x-auto">
      <table className="pp-table" aria-label="Combinations applied">
        <thead>
          <tr>
            <th scope="col">Combination</th>
            {caseIds.map((id) => (
              <th key={id} scope="col" className="text-right normal-case">
                γ <span className="pp-num">{id}</span>
              </th>
            ))}
            <th scope="col">Edition, clause and equation</th>
          </tr>
        </thead>
        <tbody>
          {combinations.map((c) => (
            <tr key={c.name} data-testid="combination" data-name={c.name}>
              <td className="pp-num">{c.name}</td>
              {caseIds.map((id) => {
                const f = c.factors[id] ?? 0;
                return (
                  <td key={id} className={`pp-num text-right ${f === 0 ? "text-ink-faint" : ""}`}>
                    {f === 0 ? "–" : formatFigure(f, 3)}
                  </td>
                );
              })}
              <td className="text-xs text-ink-soft">{c.source}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
