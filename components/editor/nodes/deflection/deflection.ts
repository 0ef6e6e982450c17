import { createCalcNode } from "../create-calc-node";

/** The deflection calc node: schema only (no React), shared by the editor and the server. */
export const deflectionNode = createCalcNode("deflection");
