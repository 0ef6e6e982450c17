import { Node, mergeAttributes } from "@tiptap/core";

/** A reference to a code or standard clause, e.g. EN 1993-1-1:2005 §6.3.1; collected for the design criteria. */
export const standardReferenceNode = Node.create({
  name: "standardReference",
  group: "inline",
  inline: true,
  atom: true,
  addAttributes() {
    return { code: { default: "" }, edition: { default: "" }, clause: { default: "" } };
  },
  parseHTML() {
    return [{ tag: 'cite[data-type="standard-reference"]' }];
  },
  renderHTML({ HTMLAttributes }) {
    const { code, edition, clause } = HTMLAttributes as { code?: string; edition?: string; clause?: string };
    const text = [code && edition ? `${code}:${edition}` : code, clause ? `§${clause}` : ""].filter(Boolean).join(" ");
    return ["cite", mergeAttributes({ "data-type": "standard-reference", class: "pp-ref" }), text];
  },
  renderText({ node }) {
    const { code, edition, clause } = node.attrs as { code: string; edition: string; clause: string };
    return [code && edition ? `${code}:${edition}` : code, clause ? `§${clause}` : ""].filter(Boolean).join(" ");
  },
});
