import type { MemberCheckRow } from "@/lib/calcs/member-design/member-design-view";
import { formatFigure } from "../combinations/format-figure";
import { PassMark } from "./pass-mark";
import { UtilizationBar } from "./utilization-bar";

export type UtilizationTableProps = {
  rows: readonly MemberCheckRow[];
  force: string;
  /** "KL/r" for steel, "le/d" for timber. */
  slenderness: string;
};

/** One line per member checked: the governing mode and force, the capacity, the utilization and the verdict with its clause. */
export function UtilizationTable({ rows, force, slenderness }: UtilizationTableProps) {
  if (rows.length === 0) return null;
  const unit = <span className="normal-case tracking-normal text-ink-faint">({force})</span>;
  return (
    <div className="overflow-x-auto">
      <table className="pp-table" aria-label="Utilization per member">
        <thead>
          <tr>
            <th scope="col">Member</th>
            <th scope="col">Check</th>
            <th scope="col" className="text-right">Demand {unit}</th>
            <th scope="col" className="text-right">Capacity {unit}</th>
            <th scope="col">Utilization</th>
            <th scope="col">Result</th>
            <th scope="col">Governs</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.member} data-testid="utilization" data-member={r.member} data-pass={r.pass} className={r.pass ? undefined : "bg-compression-light"}>
              <th scope="row" className="pp-num text-left font-normal">
                {r.member}
              </th>
              <td>
                <span className={r.mode === "tension" ? "text-tension" : "text-compression"}>{r.mode}</span>
                <span className="block text-xs text-ink-faint">
                  {slenderness} = <span className="pp-num">{formatFigure(r.slenderness, 3)}</span>
                </span>
              </td>
              <td className="pp-num text-right">{formatFigure(r.demand)}</td>
              <td className="pp-num text-right">{formatFigure(r.capacity)}</td>
              <td className="whitespace-nowrap">
                <span className="pp-num mr-2 inline-block w-12 text-right" data-testid="utilization-value" data-value={r.utilization}>
                  {r.utilization.toFixed(3)}
                </span>
                <UtilizationBar utilization={r.utilization} />
              </td>
              <td>
                <PassMark pass={r.pass} />
              </td>
              <td className="text-xs">
                <span className="block">{r.governs}</span>
                <span className="block text-ink-soft">by {r.combination}</span>
                {r.warnings.map((w) => (
                  <span key={w} className="mt-0.5 block text-caution">
                    ⚠ {w}
                  </span>
                ))}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
