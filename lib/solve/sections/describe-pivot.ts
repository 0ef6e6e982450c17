import { plainQty } from "../geometry/plain-qty";
import type { ModelUnits, PivotKind, Point } from "../geometry/types";
import { escapeTex, texQty } from "../latex";
import type { Step } from "../types";

/** How a moment point is named in the equation and in words, plus a defining line for points off the truss. */
export type PivotDescription = { label: string; words: string; step?: Step };

/**
 * Names the moment point. A joint or support keeps its label; a point off the
 * truss is numbered P1, P2 … within the section and gets its own line giving
 * its coordinates, since the checker has to find it on the drawing.
 */
export function describePivot(
  kind: PivotKind, p: Point, offTrussNumber: number, keptJoints: string[], through: string[], units: ModelUnits,
): PivotDescription {
  if (kind.kind !== "off-truss point") {
    const side = keptJoints.includes(kind.joint) ? "on the free body" : "on the removed side";
    const what = kind.kind === "support" ? "supported joint" : "joint";
    return { label: `\\mathrm{${escapeTex(kind.joint)}}`, words: `${what} ${kind.joint} (${side})` };
  }
  const name = `P${offTrussNumber}`;
  return {
    label: `P_{${offTrussNumber}}`,
    words: `point ${name}`,
    step: {
      latex: `P_{${offTrussNumber}} = \\left(${texQty(p.x, units.length)},\\ ${texQty(p.y, units.length)}\\right)`,
      text: `${name} = (${plainQty(p.x, units.length)}, ${plainQty(p.y, units.length)}) is where the lines of action of ${through.join(" and ")} meet, off the truss.`,
    },
  };
}
