import type { TrussModel } from "../types";
import { analyseStability, type TrussCount } from "./analyse-stability";
import { validateTruss } from "./validate-truss";

/**
 * m, r (2 per pin, 1 per roller) and j, with the classification of a stable
 * truss. Validates first (INVALID); throws UNSTABLE naming the joints that
 * can move when m + r < 2j or when the truss is a mechanism despite its count.
 */
export function countTruss(model: TrussModel): TrussCount {
  return analyseStability(validateTruss(model)).counts;
}
