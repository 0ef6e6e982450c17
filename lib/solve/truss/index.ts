export { validateTruss } from "./validate-truss";
export { countTruss } from "./count-truss";
export { solveTruss } from "./solve-truss";
export { convertTrussUnits, type TrussUnits } from "./convert-units";
export type { TrussCount } from "./analyse-stability";
