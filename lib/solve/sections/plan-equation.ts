import { cross } from "../geometry/cross";
import { lineIntersection } from "../geometry/line-intersection";
import { momentArm } from "../geometry/moment-arm";
import { PARALLEL_TOLERANCE } from "../geometry/parallel-tolerance";
import type { Point } from "../geometry/types";
import type { CutMember } from "./cut-member";

/**
 * The one equation that finds a cut member's force without the others:
 * moments about a point on the other lines of action, or a force sum
 * perpendicular to them when they are parallel.
 */
export type EquationPlan =
  | { kind: "moment"; pivot: Point; arm: number }
  | { kind: "force sum"; normal: Point; coefficient: number }
  | { kind: "unsolvable"; reason: string };

/**
 * Picks the equation for `cut[index]`. With three cut members the moment
 * point is where the other two meet; with two, any point on the other
 * member's line removes it, and its ends are the natural choice because they
 * are joints the checker can find on the drawing.
 */
export function planEquation(cut: CutMember[], index: number, lengthTol: number): EquationPlan {
  const self = cut[index];
  const others = cut.filter((_, i) => i !== index);
  const line = (c: CutMember) => ({ point: c.axis.point, direction: c.axis.direction });
  if (others.length === 2) {
    const pivot = lineIntersection(line(others[0]), line(others[1]));
    if (pivot) {
      const arm = momentArm(pivot, self.axis.point, self.axis.direction);
      if (Math.abs(arm) <= lengthTol) {
        return { kind: "unsolvable", reason: `All three cut members meet at one point, so no equation separates ${self.id} from the others.` };
      }
      return { kind: "moment", pivot, arm };
    }
    return forceSumAcross(self, others[0], `${self.id} is parallel to ${others[0].id} and ${others[1].id}, so no equation separates them.`);
  }
  const other = others[0];
  const candidates = [other.axis.point, farEnd(other)];
  for (const pivot of candidates) {
    const arm = momentArm(pivot, self.axis.point, self.axis.direction);
    if (Math.abs(arm) > lengthTol) return { kind: "moment", pivot, arm };
  }
  return { kind: "unsolvable", reason: `${self.id} and ${other.id} lie on one line, so their forces cannot be separated.` };
}

function farEnd(c: CutMember): Point {
  return { x: c.axis.point.x + c.axis.direction.x * c.axis.length, y: c.axis.point.y + c.axis.direction.y * c.axis.length };
}

/** Normal to `other`, oriented +y (or +x when vertical) so the sum reads as ΣFy or ΣFx where it can. */
function forceSumAcross(self: CutMember, other: CutMember, parallelReason: string): EquationPlan {
  const d = other.axis.direction;
  let normal = { x: -d.y, y: d.x };
  if (normal.y < -PARALLEL_TOLERANCE || (Math.abs(normal.y) <= PARALLEL_TOLERANCE && normal.x < 0)) {
    normal = { x: -normal.x, y: -normal.y };
  }
  const coefficient = self.axis.direction.x * normal.x + self.axis.direction.y * normal.y;
  if (Math.abs(cross(self.axis.direction, d)) < PARALLEL_TOLERANCE) {
    return { kind: "unsolvable", reason: parallelReason };
  }
  return { kind: "force sum", normal, coefficient };
}
