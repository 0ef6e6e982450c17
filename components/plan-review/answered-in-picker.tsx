"use client";

import type { AnsweredInDto, DraftPlaces } from "./plan-review-types";

export type AnsweredInPickerProps = { places: DraftPlaces; value: AnsweredInDto[]; disabled: boolean; onChange: (next: AnsweredInDto[]) => void };

const keyOf = (l: AnsweredInDto) => (l.type === "calc" ? `calc:${l.calcId}` : `heading:${l.index}`);

/** Chips for the places chosen, and a list of the draft's calcs and numbered headings to add from. */
export function AnsweredInPicker({ places, value, disabled, onChange }: AnsweredInPickerProps) {
  const chosen = new Set(value.map(keyOf));
  // By position while the heading still reads the same there, else by its text wherever it moved (as the server resolves it).
  const headingNumber = (l: { index: number; text: string }) => (places.headings.find((h) => h.index === l.index && h.text === l.text) ?? places.headings.find((h) => h.text === l.text))?.number ?? "?";

  function add(key: string) {
    if (!key || chosen.has(key)) return;
    const [type, id] = key.split(/:(.*)/s);
    if (type === "calc") {
      const calc = places.calcs.find((c) => c.id === id);
      if (calc) onChange([...value, { type: "calc", calcId: calc.id, label: calc.label }]);
    } else {
      const heading = places.headings.find((h) => h.index === Number(id));
      if (heading) onChange([...value, { type: "heading", index: heading.index, text: heading.text }]);
    }
  }

  return (
    <div className="space-y-1" data-testid="answered-in">
      <span className="pp-label block">Answered in</span>
      <ul className="flex flex-wrap gap-1.5">
        {value.length === 0 && <li className="text-xs text-ink-faint">Nowhere linked yet.</li>}
        {value.map((l) => (
          <li key={keyOf(l)} className="flex items-center gap-1 rounded-sm border border-rule bg-paper px-1.5 py-0.5 text-xs">
            <span className={l.type === "calc" ? "pp-num" : ""}>{l.type === "calc" ? l.label : disabled ? l.text : `${headingNumber(l)} ${l.text}`}</span>
            {!disabled && (
              <button type="button" className="text-ink-faint hover:text-ink" aria-label={`Remove ${l.type === "calc" ? l.label : l.text}`} onClick={() => onChange(value.filter((x) => keyOf(x) !== keyOf(l)))}>
                ×
              </button>
            )}
          </li>
        ))}
      </ul>
      {!disabled && (
        <select className="pp-input py-0.5 text-xs" value="" onChange={(e) => add(e.target.value)} aria-label="Add a place it is answered in">
          <option value="">Add a calc or heading…</option>
          <optgroup label="Calcs">
            {places.calcs.map((c) => (
              <option key={c.id} value={`calc:${c.id}`} disabled={chosen.has(`calc:${c.id}`)}>{c.label} — {c.kindName}</option>
            ))}
          </optgroup>
          <optgroup label="Headings">
            {places.headings.map((h) => (
              <option key={h.index} value={`heading:${h.index}`} disabled={chosen.has(`heading:${h.index}`)}>{h.number} {h.text}</option>
            ))}
          </optgroup>
        </select>
      )}
    </div>
  );
}
