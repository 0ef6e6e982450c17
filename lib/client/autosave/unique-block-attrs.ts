import type { TipTapNode } from "./tiptap-node";

/** Attributes the document schema requires to be unique: calcs are stored by id and referenced by label. */
const uniqueAttrs = [
  // Calc ids: 8–64 letters, digits, - or _.
  { name: "id", rename: (value: string, n: number) => `${value.slice(0, 58)}-mine${n > 1 ? n : ""}` },
  // Calc labels: a letter, then up to 15 letters, digits or _ (no hyphen, no dot).
  { name: "label", rename: (value: string, n: number) => `${value.slice(0, 10)}_mine${n > 1 ? n : ""}` },
] as const;

/**
 * Renames the later of two top-level blocks sharing an id or a label — after a
 * merge keeps both sides' copy of a calc, the author's copy is the later one —
 * so the merged document still validates and still saves. References to the
 * label keep pointing at the first copy.
 */
export function uniqueBlockAttrs(nodes: TipTapNode[]): TipTapNode[] {
  const seen = uniqueAttrs.map(() => new Set<string>());
  return nodes.map((node) => {
    let attrs = node.attrs;
    uniqueAttrs.forEach(({ name, rename }, i) => {
      const value = attrs?.[name];
      if (typeof value !== "string" || value === "") return;
      let unique = value;
      for (let n = 1; seen[i].has(unique); n++) unique = rename(value, n);
      seen[i].add(unique);
      if (unique !== value) attrs = { ...attrs, [name]: unique };
    });
    return attrs === node.attrs ? node : { ...node, attrs };
  });
}
