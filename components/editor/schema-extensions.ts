import { TableKit } from "@tiptap/extension-table";
import StarterKit from "@tiptap/starter-kit";
import { combinationsNode } from "./nodes/combinations/combinations";
import { deflectionNode } from "./nodes/deflection/deflection";
import { figureNode } from "./nodes/figure/figure";
import { formulaNode } from "./nodes/formula/formula";
import { jointNode } from "./nodes/joint/joint";
import { memberDesignNode } from "./nodes/member-design/member-design";
import { pageBreakNode } from "./nodes/page-break/page-break";
import { sectionCutNode } from "./nodes/section-cut/section-cut";
import { standardReferenceNode } from "./nodes/standard-reference/standard-reference";
import { trussNode } from "./nodes/truss/truss";

/** The calc nodes by kind, schema only: the editor adds React views to these. */
export const calcNodes = { truss: trussNode, sectionCut: sectionCutNode, joint: jointNode, formula: formulaNode, combinations: combinationsNode, memberDesign: memberDesignNode, deflection: deflectionNode };

/** The document schema without React: the same list serves the editor, the server and the export. */
export function baseExtensions() {
  return [
    StarterKit.configure({ heading: { levels: [1, 2, 3, 4] }, codeBlock: false, strike: false, underline: false, link: { openOnClick: false, protocols: ["mailto"] } }),
    TableKit.configure({ table: { resizable: false } }),
    figureNode,
    standardReferenceNode,
    pageBreakNode,
  ];
}
