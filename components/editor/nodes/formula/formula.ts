import { createCalcNode } from "../create-calc-node";

/** The formula calc node: schema only (no React), shared by the editor and the server. */
export const formulaNode = createCalcNode("formula");
