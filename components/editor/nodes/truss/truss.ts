import { createCalcNode } from "../create-calc-node";

/** The truss calc node: schema only (no React), shared by the editor and the server. */
export const trussNode = createCalcNode("truss");
