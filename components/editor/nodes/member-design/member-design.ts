import { createCalcNode } from "../create-calc-node";

/** The memberDesign calc node: schema only (no React), shared by the editor and the server. */
export const memberDesignNode = createCalcNode("memberDesign");
