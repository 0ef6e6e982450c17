import { calcKinds, type CalcKind, type CalcNode } from "./calc-types";

/** A calc node found in a document, with the path to it (`content[4]`, `content[2].content[0]`). */
export type LocatedCalc = { calc: CalcNode; path: string };

const KINDS: ReadonlySet<string> = new Set(calcKinds);

/** Deeper than any valid document may go; stops a walk over a pathological object. */
const MAX_WALK_DEPTH = 64;

/**
 * Every calc node of a TipTap/ProseMirror JSON document in document order
 * (depth first, as the text reads). Nodes without a text id and label are
 * skipped: they cannot be evaluated or referenced. Accepts anything and never throws.
 */
export function locateCalcs(document: unknown): LocatedCalc[] {
  const out: LocatedCalc[] = [];
  const stack: { node: unknown; path: string; depth: number }[] = [{ node: document, path: "", depth: 0 }];
  while (stack.length > 0) {
    const { node, path, depth } = stack.pop() as { node: unknown; path: string; depth: number };
    if (!isRecord(node) || depth > MAX_WALK_DEPTH) continue;
    if (typeof node.type === "string" && KINDS.has(node.type)) {
      const attrs = isRecord(node.attrs) ? node.attrs : {};
      if (typeof attrs.id === "string" && typeof attrs.label === "string") {
        out.push({ calc: { id: attrs.id, kind: node.type as CalcKind, label: attrs.label, inputs: attrs.inputs }, path });
      }
      continue;
    }
    const content = node.content;
    if (!Array.isArray(content)) continue;
    // Pushed in reverse so the first child is visited first.
    for (let i = content.length - 1; i >= 0; i--) stack.push({ node: content[i], path: `${path ? `${path}.` : ""}content[${i}]`, depth: depth + 1 });
  }
  return out;
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}
