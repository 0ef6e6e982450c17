import { createCalcNode } from "../create-calc-node";

/** The combinations calc node: schema only (no React), shared by the editor and the server. */
export const combinationsNode = createCalcNode("combinations");
