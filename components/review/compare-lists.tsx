import { calcKindNames } from "@/lib/calcs/calc-kind-names";
import type { CalcChange, Quantity, TextChange } from "@/lib/review/compare/snapshot";
import type { RevisionComparison } from "@/lib/review/compare-revisions";

const calcChangeWords: Record<CalcChange["change"], string> = {
  added: "added",
  removed: "removed",
  inputsChanged: "inputs changed",
  resultsChanged: "results changed (same inputs)",
};

function show(q: Quantity | null): string {
  if (!q) return "—";
  return `${Number(q.value.toPrecision(4))}${q.unit ? ` ${q.unit}` : ""}`;
}

/** The changed calcs with their governing values old → new. */
export function CalcChangeList({ calcs }: { calcs: CalcChange[] }) {
  if (calcs.length === 0) return <p className="text-sm text-ink-soft">No calc changed.</p>;
  return (
    <ul className="space-y-3" data-testid="changed-calcs">
      {calcs.map((c) => (
        <li key={c.calcId} data-calc-id={c.calcId} data-change={c.change} className="text-sm">
          <p>
            <span className="pp-num font-semibold">{c.label}</span> <span className="text-ink-soft">{calcKindNames[c.kind]}</span> — {calcChangeWords[c.change]}
          </p>
          {c.values.length > 0 && (
            <table className="pp-table mt-1 w-full text-xs">
              <tbody>
                {c.values.slice(0, 12).map((v) => (
                  <tr key={v.name}>
                    <td className="pp-num">{v.name}</td>
                    <td className="pp-num text-right">{show(v.old)}</td>
                    <td aria-hidden="true">→</td>
                    <td className="pp-num text-right">{show(v.new)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
          {c.values.length > 12 && <p className="text-xs text-ink-faint">and {c.values.length - 12} more values</p>}
        </li>
      ))}
    </ul>
  );
}

const textWords: Record<TextChange["change"], string> = { added: "Added", removed: "Removed", changed: "Changed" };

/** Narrative blocks added, removed or changed, with the text before and after. */
export function TextChangeList({ text }: { text: TextChange[] }) {
  if (text.length === 0) return <p className="text-sm text-ink-soft">No text changed.</p>;
  return (
    <ul className="space-y-2 text-sm" data-testid="text-changes">
      {text.map((t, i) => (
        <li key={i}>
          <p className="text-xs font-medium uppercase tracking-wide text-ink-soft">{textWords[t.change]} {t.kind}</p>
          {t.before !== null && <p className="text-ink-faint line-through">{t.before.slice(0, 300)}</p>}
          {t.after !== null && <p>{t.after.slice(0, 300)}</p>}
        </li>
      ))}
    </ul>
  );
}

/** Remarks raised and closed between the two sides. */
export function RemarkEventList({ remarks }: { remarks: RevisionComparison["remarks"] }) {
  const line = (r: RevisionComparison["remarks"]["raised"][number], who: string) => (
    <li key={r.id}>
      {r.calcLabel && <span className="pp-num font-semibold">{r.calcLabel}: </span>}
      {r.text.slice(0, 200)} <span className="text-ink-faint">— {who}</span>
    </li>
  );
  return (
    <div className="space-y-2 text-sm" data-testid="remark-events">
      <p className="text-xs font-medium uppercase tracking-wide text-ink-soft">Raised ({remarks.raised.length})</p>
      {remarks.raised.length === 0 ? <p className="text-ink-soft">None.</p> : <ul className="space-y-1">{remarks.raised.map((r) => line(r, r.openedBy))}</ul>}
      <p className="text-xs font-medium uppercase tracking-wide text-ink-soft">Closed ({remarks.closed.length})</p>
      {remarks.closed.length === 0 ? <p className="text-ink-soft">None.</p> : <ul className="space-y-1">{remarks.closed.map((r) => line(r, r.closedBy ?? "?"))}</ul>}
    </div>
  );
}
