import { directionArrow } from "../geometry/direction-arrow";
import { plainQty } from "../geometry/plain-qty";
import type { ExternalForce, ModelUnits } from "../geometry/types";
import { escapeTex } from "../latex";
import type { Step } from "../types";

/**
 * Lists the loads and reactions on a free body as magnitude and arrow, so the
 * checker can match them to the sketch before reading the equations.
 */
export function freeBodyStep(external: ExternalForce[], units: ModelUnits, what: string): Step {
  if (external.length === 0) {
    return { latex: "\\text{No loads or reactions act on the free body}", text: `No loads or reactions act on ${what}.` };
  }
  const items: string[] = [];
  const words: string[] = [];
  for (const f of external) {
    const sym = f.kind === "reaction" ? "R" : "P";
    const j = escapeTex(f.joint);
    for (const [axis, v] of [["x", f.fx], ["y", f.fy]] as const) {
      if (v === 0) continue;
      items.push(`${sym}_{${axis},\\mathrm{${j}}} = ${directionArrow(v, axis, units.force)}`);
      const way = axis === "x" ? (v > 0 ? "to the right" : "to the left") : v > 0 ? "upwards" : "downwards";
      words.push(`${f.kind} at ${f.joint} ${plainQty(Math.abs(v), units.force)} ${way}`);
    }
  }
  return { latex: items.join(",\\quad "), text: `Forces on ${what}: ${words.join("; ")}.` };
}
