import { Node, mergeAttributes } from "@tiptap/core";

/** A figure: an image from the package's file store with a caption. */
export const figureNode = Node.create({
  name: "figure",
  group: "block",
  atom: true,
  draggable: true,
  addAttributes() {
    return { src: { default: null }, alt: { default: "" }, caption: { default: "" } };
  },
  parseHTML() {
    return [{ tag: 'figure[data-type="figure"]' }];
  },
  renderHTML({ HTMLAttributes }) {
    const { src, alt, caption } = HTMLAttributes as { src?: string; alt?: string; caption?: string };
    return ["figure", mergeAttributes({ "data-type": "figure" }), ["img", { src, alt }], ["figcaption", {}, caption ?? ""]];
  },
});
