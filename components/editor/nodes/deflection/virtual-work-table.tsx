import { formatFigure } from "../combinations/format-figure";
import type { VirtualWorkTable as VirtualWorkTableData } from "./virtual-work-rows";

/** The unit-load method laid out as a checker writes it by hand: one line per member, then the sum. */
export function VirtualWorkTable({ table, symbol }: { table: VirtualWorkTableData; symbol: string }) {
  const { units } = table;
  const head = (label: string, unit?: string) => (
    <th scope="col" className="text-right normal-case">
      {label}
      {unit && <span className="tracking-normal text-ink-faint"> ({unit})</span>}
    </th>
  );
  return (
    <div className="overflow-x-auto">
      <table className="pp-table" aria-label="Virtual work table">
        <thead>
          <tr>
            <th scope="col">Member</th>
            {head("N", units.force)}
            {head("n", `${units.force}/${units.force}`)}
            {head("L", units.length)}
            {head("A", units.area)}
            {head("E", units.modulus)}
            {head("N·n·L/(A·E)", units.deflection)}
          </tr>
        </thead>
        <tbody>
          {table.rows.map((r) => (
            <tr key={r.member}>
              <th scope="row" className="pp-num text-left font-normal">
                {r.member}
              </th>
              <td className="pp-num text-right">{formatFigure(r.N)}</td>
              <td className="pp-num text-right">{formatFigure(r.n)}</td>
              <td className="pp-num text-right">{formatFigure(r.L)}</td>
              <td className="pp-num text-right">{r.A === undefined ? "—" : formatFigure(r.A)}</td>
              <td className="pp-num text-right">{r.E === undefined ? "—" : formatFigure(r.E)}</td>
              <td className={`pp-num text-right ${Math.abs(r.contribution) < 1e-9 ? "text-ink-faint" : ""}`}>{formatFigure(r.contribution)}</td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr className="border-t-2 border-ink">
            <th scope="row" colSpan={6} className="px-3 py-2 text-right text-xs font-medium uppercase tracking-wide text-ink-soft">
              Σ = {symbol}
            </th>
            <td className="pp-num px-3 py-2 text-right font-semibold">
              {formatFigure(table.sum)} {units.deflection}
            </td>
          </tr>
        </tfoot>
      </table>
    </div>
  );
}
