import { Extension, InputRule, type Editor } from "@tiptap/core";
import type { Node as PmNode } from "@tiptap/pm/model";
import { NodeSelection } from "@tiptap/pm/state";
import { calcKinds, type CalcKind } from "@/lib/calcs/calc-types";
import { calcCommand } from "./calc-kind-name";
import { newCalcAttrs } from "./new-calc-attrs";

declare module "@tiptap/core" {
  interface Commands<ReturnType> {
    calcs: {
      /** Inserts a new calc of this kind with a fresh id, the next free label and default inputs. */
      insertCalc: (kind: CalcKind) => ReturnType;
    };
  }
}

/** Labels already used in the document, so a new calc gets the next free one. */
export function labelsIn(doc: PmNode): string[] {
  const out: string[] = [];
  doc.descendants((n) => {
    if ((calcKinds as readonly string[]).includes(n.type.name) && n.attrs.label) out.push(String(n.attrs.label));
    return true;
  });
  return out;
}

/**
 * Calc insertion: the `insertCalc` command (used by the menu) and typing
 * `/truss`, `/cut`, `/formula` … followed by a space at the start of a line.
 */
export const CalcCommands = Extension.create({
  name: "calcCommands",
  addCommands() {
    return {
      insertCalc:
        (kind) =>
        ({ state, chain }) =>
          // With a calc (or any node) selected, put the new one after it rather than replacing it.
          state.selection instanceof NodeSelection
            ? chain().insertContentAt(state.selection.to, { type: kind, attrs: newCalcAttrs(kind, labelsIn(state.doc)) }).run()
            : chain().insertContent({ type: kind, attrs: newCalcAttrs(kind, labelsIn(state.doc)) }).run(),
    };
  },
  addInputRules() {
    return calcKinds.map(
      (kind) =>
        new InputRule({
          find: new RegExp(`^/${calcCommand[kind]}\\s$`),
          handler: ({ state, range }) => {
            const node = state.schema.nodes[kind].create(newCalcAttrs(kind, labelsIn(state.doc)));
            const $from = state.doc.resolve(range.from);
            // Replace the whole (now empty) paragraph, not just the typed command.
            state.tr.replaceRangeWith($from.before(), $from.after(), node);
          },
        }),
    );
  },
});

export function insertCalc(editor: Editor, kind: CalcKind): void {
  editor.chain().focus().insertCalc(kind).run();
}
