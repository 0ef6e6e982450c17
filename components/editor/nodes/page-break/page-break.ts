import { Node } from "@tiptap/core";

/** Forces a new sheet in the exported package. */
export const pageBreakNode = Node.create({
  name: "pageBreak",
  group: "block",
  atom: true,
  parseHTML() {
    return [{ tag: 'div[data-type="page-break"]' }];
  },
  renderHTML() {
    return ["div", { "data-type": "page-break", class: "pp-page-break" }];
  },
});
