import type { CombinationsView as CombinationsViewData } from "@/lib/calcs/combinations/combinations-view";
import { ForceCell } from "./force-cell";

export type GoverningTableProps = {
  members: CombinationsViewData["members"];
  force: string;
};

/**
 * The governing combination of every member: the most tensile and the most
 * compressive force over all combinations, each with the combination that
 * gives it (T tension, C compression).
 */
export function GoverningTable({ members, force }: GoverningTableProps) {
  if (members.length === 0) return null;
  return (
    <div className="overflow-x-auto">
      <table className="pp-table" aria-label="Governing combination per member">
        <thead>
          <tr>
            <th scope="col">Member</th>
            <th scope="col" className="text-right">
              Max N <span className="normal-case tracking-normal text-ink-faint">({force})</span> and combination
            </th>
            <th scope="col" className="text-right">
              Min N <span className="normal-case tracking-normal text-ink-faint">({force})</span> and combination
            </th>
          </tr>
        </thead>
        <tbody>
          {members.map((m) => (
            <tr key={m.member} data-testid="governing" data-member={m.member}>
              <th scope="row" className="pp-num text-left font-normal">
                {m.member}
              </th>
              <ForceCell value={m.max.value} combination={m.max.combination} />
              <ForceCell value={m.min.value} combination={m.min.combination} />
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 text-xs text-ink-faint">Tension positive; T tension, C compression.</p>
    </div>
  );
}
