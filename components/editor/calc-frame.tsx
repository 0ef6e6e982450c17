"use client";

import { NodeViewWrapper } from "@tiptap/react";
import { useRef, useState, type ReactNode } from "react";
import { MathVisibility } from "@/components/math/math-visibility";
import { useNearScreen } from "./use-near-screen";
import type { CalcResult } from "@/lib/calcs/calc-types";
import { CalcCheckBar } from "@/components/review/calc-check-bar";
import { calcKindName } from "./calc-kind-name";

export type CalcFrameProps = {
  /** The calc's id: what remarks and check marks are attached to. */
  calcId: string;
  kind: keyof typeof calcKindName;
  label: string;
  result: CalcResult | undefined;
  editable: boolean;
  selected: boolean;
  onRename: (label: string) => void;
  /** The result line shown when the working is collapsed, e.g. "F_U2U3 = −240 kN (compression)". */
  summary?: ReactNode;
  children: ReactNode;
};

/** The frame every calc shares: label, kind, state in words, problems, and its body. */
export function CalcFrame({ calcId, kind, label, result, editable, selected, onRename, summary, children }: CalcFrameProps) {
  const [draft, setDraft] = useState(label);
  const status = result?.status ?? "ok";
  const ref = useRef<HTMLDivElement>(null);
  const near = useNearScreen(ref);
  return (
    <NodeViewWrapper
      ref={ref}
      className={`pp-calc not-prose my-4 rounded-sm border bg-paper-raised ${selected ? "border-verdigris" : "border-rule-strong"}`}
      data-calc-label={label}
      data-calc-id={calcId}
      data-calc-status={status}
      contentEditable={false}
    >
      <header className="flex items-center gap-3 border-b border-rule px-3 py-1.5 text-sm" data-drag-handle>
        {editable ? (
          <input
            className="pp-num w-20 rounded-sm border border-transparent bg-transparent px-1 font-semibold hover:border-rule-strong focus:border-verdigris focus:outline-none"
            aria-label={`Label of ${calcKindName[kind]} calc`}
            value={draft}
            onChange={(e) => setDraft(e.target.value)}
            onBlur={() => draft !== label && onRename(draft)}
          />
        ) : (
          <span className="pp-num font-semibold">{label}</span>
        )}
        <span className="text-ink-soft">{calcKindName[kind]}</span>
        <span className="ml-auto text-xs" data-testid="calc-status">
          {status === "ok" ? "✓ computed" : status === "blocked" ? "◌ waiting on an input calc" : "✕ has a problem"}
        </span>
      </header>
      <CalcCheckBar calcId={calcId} label={label} />
      {result && result.messages.length > 0 && (
        <ul className="border-b border-caution bg-caution-light px-3 py-1.5 text-sm text-caution" role="alert">
          {result.messages.map((m) => (
            <li key={m}>{m}</li>
          ))}
        </ul>
      )}
      <MathVisibility.Provider value={near}>
        <div className="space-y-3 px-3 py-3">{children}</div>
      </MathVisibility.Provider>
      {summary && <footer className="border-t border-rule px-3 py-1.5 text-sm" data-testid="calc-summary">{summary}</footer>}
    </NodeViewWrapper>
  );
}
