import { createCalcNode } from "../create-calc-node";

/** The sectionCut calc node: schema only (no React), shared by the editor and the server. */
export const sectionCutNode = createCalcNode("sectionCut");
