import { Tex } from "@/components/math/tex";
import type { FormulaItem } from "./formula-line-items";

export type FormulaLinesProps = {
  items: readonly FormulaItem[];
  /** Collapsed to the results: each value as name = result, without the working. */
  collapsed?: boolean;
  id?: string;
};

/**
 * The typeset lines, each beside its source line number: symbol = expression
 * = numbers = result, with the result again in plain figures on the right; a
 * line with a problem keeps its place, shows its source and says what is wrong.
 */
export function FormulaLines({ items, collapsed = false, id }: FormulaLinesProps) {
  if (items.length === 0) return null;
  return (
    <ol id={id} className="divide-y divide-rule border-y border-rule" aria-label="Formula lines">
      {items.map((item) => (
        <FormulaLineRow key={`${item.kind}-${item.line}`} item={item} collapsed={collapsed} />
      ))}
    </ol>
  );
}

function FormulaLineRow({ item, collapsed }: { item: FormulaItem; collapsed: boolean }) {
  const number = (bad: boolean) => (
    <span className={`pp-num w-9 shrink-0 pt-0.5 text-right text-xs ${bad ? "font-semibold text-compression" : "text-ink-faint"}`} aria-label={`line ${item.line}`}>
      {bad && <span aria-hidden="true">✕ </span>}
      {item.line}
    </span>
  );
  if (item.kind === "note") {
    if (collapsed) return null;
    return (
      <li className="flex gap-3 py-1.5">
        {number(false)}
        <p className="font-serif text-sm italic text-ink-soft">{item.text}</p>
      </li>
    );
  }
  if (item.kind === "error") {
    return (
      <li className="flex gap-3 bg-compression-light py-1.5" data-testid="formula-line" data-name={item.name} data-error="true">
        {number(true)}
        <div className="min-w-0 flex-1">
          <code className="block overflow-x-auto whitespace-pre font-mono text-xs text-ink">{item.source}</code>
          <p className="mt-0.5 text-xs text-compression" role="alert">
            Line {item.line}: {item.message}
          </p>
        </div>
      </li>
    );
  }
  return (
    <li className="flex items-start gap-3 py-1.5" data-testid="formula-line" data-name={item.name}>
      {number(false)}
      <div className="min-w-0 flex-1">
        {collapsed ? (
          <code className="font-mono text-xs">{item.name}</code>
        ) : (
          <div className="overflow-x-auto">
            <Tex latex={item.latex} />
          </div>
        )}
        {item.note && <p className="mt-0.5 text-xs text-ink-soft">{item.note}</p>}
      </div>
      <span className="pp-num shrink-0 pt-0.5 text-sm" data-testid="formula-value" data-value={item.value} data-unit={item.unit}>
        {item.display.replace(/^-/, "\u2212")}
      </span>
    </li>
  );
}
