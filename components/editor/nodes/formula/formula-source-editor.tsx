"use client";

import { useId, useState } from "react";

export type FormulaSourceEditorProps = {
  source: string;
  onChange: (source: string) => void;
  readOnly: boolean;
  /** The problem on each line (from 1): its number is marked in the gutter. */
  errorLines: ReadonlyMap<number, string>;
  /** Id of the element listing the problems, read out with the field. */
  describedBy?: string;
};

/**
 * The lines of a Formula calc as plain monospace text with line numbers.
 * Lines never wrap and the field grows with its text, so each number in the
 * gutter stays level with its line; a line with a problem has its number
 * marked by colour and by a cross.
 */
export function FormulaSourceEditor({ source, onChange, readOnly, errorLines, describedBy }: FormulaSourceEditorProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  // Typing may run ahead of the document: the draft shows while the stored source is still the one it was typed
  // against, or has caught up with it; any other stored source is a change from outside (undo, a merge) and wins.
  const [draft, setDraft] = useState<{ text: string; base: string } | null>(null);
  const text = draft !== null && (draft.base === source || draft.text === source) ? draft.text : source;
  const lines = text.split("\n");
  return (
    <div>
      <label htmlFor={id} className="pp-label">
        Lines
      </label>
      <div className={`flex rounded-sm border ${errorLines.size > 0 ? "border-compression" : "border-rule-strong"} bg-white focus-within:border-verdigris`}>
        <ol aria-hidden="true" className="select-none border-r border-rule bg-paper-sunk py-2 font-mono text-xs leading-5 text-ink-faint">
          {lines.map((_, i) => {
            const bad = errorLines.has(i + 1);
            return (
              <li key={i} className={bad ? "bg-compression-light px-2 text-right font-semibold tabular-nums text-compression" : "px-2 text-right tabular-nums"} title={errorLines.get(i + 1)}>
                {bad ? "✕\u2009" : ""}
                {i + 1}
              </li>
            );
          })}
        </ol>
        <textarea
          id={id}
          className="min-w-0 flex-1 resize-none overflow-x-auto whitespace-pre bg-transparent px-2.5 py-2 font-mono text-xs leading-5 text-ink focus:outline-none"
          rows={Math.max(3, lines.length)}
          wrap="off"
          spellCheck={false}
          autoCapitalize="off"
          autoComplete="off"
          readOnly={readOnly}
          value={text}
          aria-invalid={errorLines.size > 0 || undefined}
          aria-describedby={[readOnly ? "" : hintId, describedBy ?? ""].filter(Boolean).join(" ") || undefined}
          onChange={(e) => {
            const next = e.target.value;
            setDraft({ text: next, base: source });
            onChange(next);
          }}
        />
      </div>
      {!readOnly && <FormulaSyntaxHint id={hintId} />}
    </div>
  );
}

/** The whole syntax in one line, for the author who has not written a formula here before. */
function FormulaSyntaxHint({ id }: { id: string }) {
  const code = "rounded-sm bg-paper-sunk px-1 font-mono text-[11px] text-ink";
  return (
    <p id={id} className="mt-1 text-xs leading-relaxed text-ink-soft">
      One value per line: <code className={code}>name = expression</code>. Units after numbers (<code className={code}>5 kN/m</code>,{" "}
      <code className={code}>2865 mm^2</code>); another calc&apos;s value as <code className={code}>T1.F_U2U3_G</code>; notes after{" "}
      <code className={code}># </code>; <code className={code}>-&gt; MPa</code> at the end gives the result in that unit.
    </p>
  );
}
