import type { SplitList } from "@/lib/plan-review/split-numbered-list";

/** How the paste will be split, before anything is saved. */
export function PastePreview({ split }: { split: SplitList }) {
  if (split.items.length === 0) return null;
  return (
    <div className="space-y-1.5" data-testid="paste-preview">
      <p className="pp-label">
        {split.numbered ? `${split.items.length} comment${split.items.length === 1 ? "" : "s"} found` : "No numbering found: this will be one comment"}
      </p>
      {split.preamble && (
        <p className="text-xs text-ink-faint">Not saved (before the first number): “{split.preamble.length > 140 ? `${split.preamble.slice(0, 137)}…` : split.preamble}”</p>
      )}
      <ol className="space-y-1">
        {split.items.map((item, i) => (
          <li key={i} className="flex gap-2 rounded-sm border border-rule bg-paper px-2 py-1 text-sm" data-testid="preview-item">
            <span className="pp-num w-12 shrink-0 font-semibold">{item.number}</span>
            <span className="whitespace-pre-wrap">{item.text}</span>
          </li>
        ))}
      </ol>
    </div>
  );
}
