import type { RevisionComparison } from "@/lib/review/compare-revisions";
import { CompareBlock } from "./compare-block";
import { CalcChangeList, RemarkEventList, TextChangeList } from "./compare-lists";

/**
 * The newer side's narrative with a change bar in the margin beside each
 * changed block and calc (and a note where a block was removed), and beside
 * it the lists: calcs with governing values old → new, text, remarks.
 */
export function CompareView({ comparison }: { comparison: RevisionComparison }) {
  const { calcs, text } = comparison;
  const content = ((comparison.document as { content?: unknown[] } | null)?.content ?? []) as { type?: string; attrs?: Record<string, unknown> }[];
  const barAt = new Map<number, string>();
  for (const t of text) if (t.change !== "removed") barAt.set(t.newIndex, t.change === "added" ? "added" : "text changed");
  for (const c of calcs) if (c.newIndex !== null) barAt.set(c.newIndex, c.change === "added" ? "calc added" : c.change === "inputsChanged" ? "inputs changed" : "results changed");
  const removedAt = new Map<number, string[]>();
  for (const t of text) if (t.change === "removed") removedAt.set(t.newIndex, [...(removedAt.get(t.newIndex) ?? []), t.before ?? ""]);
  for (const c of calcs) if (c.change === "removed") removedAt.set(content.length, [...(removedAt.get(content.length) ?? []), `${c.label} (calc)`]);

  const removedNote = (i: number) =>
    removedAt.get(i)?.map((before, k) => (
      <p key={`r${i}-${k}`} className="border-l-4 border-compression pl-3 text-xs text-compression" data-change-bar="removed">
        Removed: <span className="line-through">{before.slice(0, 160)}</span>
      </p>
    ));

  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <section aria-label={`Narrative of ${comparison.to.label}`} className="pp-panel space-y-2 p-5">
        {content.map((node, i) => {
          const bar = barAt.get(i);
          return (
            <div key={i}>
              {removedNote(i)}
              <div className={bar ? "border-l-4 border-caution pl-3" : "border-l-4 border-transparent pl-3"} data-change-bar={bar}>
                {bar && <span className="sr-only">({bar}) </span>}
                <CompareBlock node={node} />
              </div>
            </div>
          );
        })}
        {removedNote(content.length)}
      </section>
      <aside className="space-y-5">
        <section className="pp-panel space-y-2 p-4" aria-label="Changed calcs">
          <h3 className="font-semibold">Calcs ({calcs.length})</h3>
          <CalcChangeList calcs={calcs} />
        </section>
        <section className="pp-panel space-y-2 p-4" aria-label="Text changes">
          <h3 className="font-semibold">Text ({text.length})</h3>
          <TextChangeList text={text} />
        </section>
        <section className="pp-panel space-y-2 p-4" aria-label="Remarks between the two">
          <h3 className="font-semibold">Remarks</h3>
          <RemarkEventList remarks={comparison.remarks} />
        </section>
      </aside>
    </div>
  );
}
