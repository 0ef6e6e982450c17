import { Node, mergeAttributes } from "@tiptap/core";
import type { CalcKind } from "@/lib/calcs/calc-types";

/**
 * Every calc is an atom block node holding only its identity and inputs; its
 * results are derived by lib/calcs, never stored in the document. Name is the
 * CalcKind (camelCase), `data-type` its kebab-case form.
 */
export function createCalcNode(kind: CalcKind) {
  const dataType = kind.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);
  return Node.create({
    name: kind,
    group: "block",
    atom: true,
    draggable: true,
    selectable: true,
    addAttributes() {
      return {
        id: { default: null },
        label: { default: null },
        inputs: {
          default: null,
          // Inputs travel as JSON in HTML (copy/paste between packages keeps them).
          parseHTML: (el: HTMLElement) => parseInputs(el.getAttribute("data-inputs")),
          renderHTML: (attrs: { inputs?: unknown }) => ({ "data-inputs": JSON.stringify(attrs.inputs ?? null) }),
        },
      };
    },
    parseHTML() {
      return [{ tag: `div[data-type="${dataType}"]` }];
    },
    renderHTML({ HTMLAttributes }) {
      return ["div", mergeAttributes(HTMLAttributes, { "data-type": dataType })];
    },
  });
}

function parseInputs(raw: string | null): unknown {
  if (!raw) return null;
  try {
    return JSON.parse(raw);
  } catch (e) {
    // A hand-edited or truncated attribute: keep the calc, let validation name the problem.
    return { unreadable: e instanceof Error ? e.message : String(e) };
  }
}
