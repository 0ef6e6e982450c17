import { createCalcNode } from "../create-calc-node";

/** The joint calc node: schema only (no React), shared by the editor and the server. */
export const jointNode = createCalcNode("joint");
