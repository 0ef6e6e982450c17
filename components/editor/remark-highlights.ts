import { Extension } from "@tiptap/core";
import type { Node as PmNode } from "@tiptap/pm/model";
import { Plugin, PluginKey } from "@tiptap/pm/state";
import { Decoration, DecorationSet } from "@tiptap/pm/view";
import type { TextRun } from "@/lib/review/find-quote";

export type HighlightRange = { id: string; from: number; to: number; state: "open" | "answered" | "closed" };

export const remarkHighlightsKey = new PluginKey<DecorationSet>("remarkHighlights");

/**
 * Marks the text each remark quotes. The marks are decorations, not document
 * content: they are mapped through every edit (so they follow their words as
 * text is typed around them) and never reach the stored document.
 */
export const RemarkHighlights = Extension.create({
  name: "remarkHighlights",
  addProseMirrorPlugins() {
    return [
      new Plugin<DecorationSet>({
        key: remarkHighlightsKey,
        state: {
          init: () => DecorationSet.empty,
          apply(tr, set) {
            const ranges = tr.getMeta(remarkHighlightsKey) as HighlightRange[] | undefined;
            if (ranges) {
              return DecorationSet.create(
                tr.doc,
                ranges.map((r) => Decoration.inline(r.from, r.to, { class: `pp-remark-anchor pp-remark-${r.state}`, "data-remark-id": r.id }, { remarkId: r.id })),
              );
            }
            return set.map(tr.mapping, tr.doc);
          },
        },
        props: { decorations: (state) => remarkHighlightsKey.getState(state) },
      }),
    ];
  },
});

/** Every textblock of the editor's document with its position, for re-finding quotes. */
export function textRunsOf(doc: PmNode): TextRun[] {
  const runs: TextRun[] = [];
  doc.descendants((node, pos) => {
    if (node.isTextblock) {
      runs.push({ start: pos + 1, text: node.textBetween(0, node.content.size, undefined, "\ufffc") });
      return false;
    }
    return true;
  });
  return runs;
}

/** Where each remark's highlight sits now (after the edits since it was placed), by remark id. */
export function currentHighlightPositions(set: DecorationSet | undefined): Map<string, number> {
  const out = new Map<string, number>();
  for (const d of set?.find() ?? []) {
    const id = (d.spec as { remarkId?: string }).remarkId;
    if (id && !out.has(id)) out.set(id, d.from);
  }
  return out;
}
