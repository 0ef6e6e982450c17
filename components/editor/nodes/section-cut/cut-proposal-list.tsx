"use client";

import { useMemo } from "react";
import { formatNumber } from "@/components/diagrams/format-number";
import type { TrussModel } from "@/lib/solve";
import { cutProposals } from "./cut-proposals";
import { listPanels } from "./list-panels";

export type CutProposalListProps = {
  model: TrussModel;
  panel: number | string | undefined;
  readOnly: boolean;
  onPanel: (panel: number | string | undefined) => void;
  onUse: (cut: { members: string[]; keep: string }) => void;
};

/**
 * Proposed sections through a chosen panel, simplest first, each with the
 * moment points it needs in words; one click takes it as the cut.
 */
export function CutProposalList({ model, panel, readOnly, onPanel, onUse }: CutProposalListProps) {
  const panels = useMemo(() => listPanels(model), [model]);
  const { proposals, problem } = useMemo(() => cutProposals(model, panel), [model, panel]);
  return (
    <section aria-label="Proposed cuts" className="space-y-1.5">
      <label className="inline-flex items-center gap-2 text-sm">
        <span className="pp-label mb-0">Propose a cut through</span>
        <select className="pp-input w-auto py-0.5" value={panel === undefined ? "" : String(panel)} disabled={readOnly} onChange={(e) => onPanel(panelValue(e.target.value))}>
          <option value="">anywhere</option>
          {panels.map((p) => (
            <option key={p.index} value={p.index}>
              panel {p.index} ({p.chord ?? "no chord"}, x {formatNumber(p.x0)} to {formatNumber(p.x1)})
            </option>
          ))}
          {typeof panel === "string" && <option value={panel}>panel of {panel}</option>}
        </select>
      </label>
      {problem && <p className="text-xs text-ink-soft">{problem}</p>}
      <ol className="space-y-1 text-sm">
        {proposals.map((p) => (
          <li key={p.members.join(",")} className="flex flex-wrap items-baseline gap-2">
            {!readOnly && (
              <button type="button" className="pp-btn-quiet px-2 py-0.5 text-xs" onClick={() => onUse({ members: p.members, keep: p.keep })}>
                Use
              </button>
            )}
            <span>{p.description}</span>
          </li>
        ))}
      </ol>
    </section>
  );
}

/** A panel as the select gives it: blank for anywhere, an index, or the bottom-chord member it was named by. */
function panelValue(text: string): number | string | undefined {
  if (text === "") return undefined;
  return /^\d+$/.test(text) ? Number(text) : text;
}
