import type { TipTapNode } from "./tiptap-node";

function nodeText(node: TipTapNode): string {
  if (node.type === "text") return node.text ?? "";
  if (node.type === "hardBreak") return "\n";
  const children = node.content ?? [];
  if (children.length === 0) {
    // Calc nodes have no text of their own; name them so the copy shows where they stood.
    const label = node.attrs?.label;
    return typeof label === "string" && label !== "" ? `[${node.type} ${label}]` : "";
  }
  const inline = children.some((child) => child.type === "text");
  return children
    .map(nodeText)
    .filter((text) => text !== "")
    .join(inline ? "" : "\n");
}

/** A document as plain text, blocks separated by blank lines, for the clipboard. */
export function documentPlainText(document: TipTapNode): string {
  return (document.content ?? [])
    .map(nodeText)
    .filter((text) => text !== "")
    .join("\n\n");
}
