import { alignSequences } from "./align-sequences";
import { narrativeBlocks, type NarrativeBlock } from "./narrative-blocks";
import type { TextChange } from "./snapshot";

/**
 * Block-level changes of the narrative: blocks are matched by kind and text
 * with an LCS, so moved-around or untouched blocks are not reported. In each
 * run of differences a removed block and an added block of the same kind are
 * paired, in order, as one changed block with its before and after text.
 */
export function compareText(older: unknown, newer: unknown): TextChange[] {
  const a = narrativeBlocks(older);
  const b = narrativeBlocks(newer);
  const key = (x: NarrativeBlock) => `${x.kind}\u0000${x.text}`;
  const steps = alignSequences(a.map(key), b.map(key));
  const newLength = topLevelLength(newer);
  const out: TextChange[] = [];
  let removed: NarrativeBlock[] = [];
  let added: NarrativeBlock[] = [];
  const flush = (nextNewIndex: number) => {
    out.push(...pairRun(removed, added, nextNewIndex));
    removed = [];
    added = [];
  };
  for (const s of steps) {
    if (s.op === "same") flush(b[s.b].index);
    else if (s.op === "removed") removed.push(a[s.a]);
    else added.push(b[s.b]);
  }
  flush(newLength);
  return out;
}

function pairRun(removed: NarrativeBlock[], added: NarrativeBlock[], nextNewIndex: number): TextChange[] {
  const out: TextChange[] = [];
  const used = new Set<number>();
  let from = 0;
  const pendingRemoved: NarrativeBlock[] = [];
  for (const r of removed) {
    const k = added.findIndex((x, i) => i >= from && !used.has(i) && x.kind === r.kind);
    if (k === -1) {
      pendingRemoved.push(r);
      continue;
    }
    used.add(k);
    from = k + 1;
    out.push({ change: "changed", kind: r.kind, before: r.text, after: added[k].text, oldIndex: r.index, newIndex: added[k].index });
  }
  added.forEach((x, i) => {
    if (!used.has(i)) out.push({ change: "added", kind: x.kind, before: null, after: x.text, oldIndex: null, newIndex: x.index });
  });
  // A removed block has no place in the newer document: it is shown before the block that now follows it.
  const firstAfter = out.length > 0 ? Math.min(...out.map((c) => c.newIndex)) : nextNewIndex;
  for (const r of pendingRemoved) out.push({ change: "removed", kind: r.kind, before: r.text, after: null, oldIndex: r.index, newIndex: Math.min(firstAfter, nextNewIndex) });
  return out.sort((x, y) => x.newIndex - y.newIndex || (x.oldIndex ?? 0) - (y.oldIndex ?? 0));
}

function topLevelLength(document: unknown): number {
  const content = (document as { content?: unknown } | null)?.content;
  return Array.isArray(content) ? content.length : 0;
}
