import { SolveError } from "../errors";
import { lengthTolerance } from "../geometry/length-tolerance";
import type { TrussModel } from "../types";

/** A panel: the open x-interval between two consecutive bottom joints, and its bottom-chord member if there is one. */
export type Panel = { index: number; x0: number; x1: number; chord?: string };

/**
 * Resolves a panel reference. The bottom joints are the joints at the lowest
 * level of the truss (within a billionth of its size), sorted by x; panel i
 * (counting from 0 at the left) lies between bottom joints i and i+1. A panel
 * may also be named by its bottom-chord member, the member joining those two
 * joints. Trusses whose bottom chord is not level (scissors, cambered) have
 * no panels in this sense; cut them by naming a member instead.
 */
export function resolvePanel(model: TrussModel, panel: number | string): Panel {
  const tol = lengthTolerance(model);
  const low = Math.min(...model.joints.map((j) => j.y));
  const bottom = model.joints.filter((j) => Math.abs(j.y - low) <= tol).sort((a, b) => a.x - b.x);
  const chordBetween = (i: number) =>
    model.members.find((m) => {
      const ends = [m.start, m.end];
      return ends.includes(bottom[i].id) && ends.includes(bottom[i + 1].id);
    })?.id;
  let index: number;
  if (typeof panel === "number") {
    if (!Number.isInteger(panel) || panel < 0 || panel >= bottom.length - 1) {
      throw new SolveError("INVALID", `Panel ${panel} does not exist: the bottom chord has ${Math.max(0, bottom.length - 1)} panels, numbered from 0.`, { path: "panel" });
    }
    index = panel;
  } else {
    index = bottom.slice(0, -1).findIndex((_, i) => chordBetween(i) === panel);
    if (index < 0) {
      throw new SolveError("INVALID", `Member ${panel} is not a bottom-chord member between two consecutive bottom joints.`, { path: "panel" });
    }
  }
  return { index, x0: bottom[index].x, x1: bottom[index + 1].x, chord: chordBetween(index) };
}
