import { splitJoints } from "../geometry/split-joints";
import type { TrussModel } from "../types";

/** How a set of cut members divides the truss: two sides, or why it does not. */
export type CutSplit =
  | { ok: true; sides: [string[], string[]] }
  | { ok: false; reason: string };

/**
 * Checks that removing `members` leaves exactly two connected parts and that
 * every cut member joins one part to the other. A member with both ends on one
 * side is not cut by the section at all: its force would be internal to a free
 * body, and the section would not be the one the engineer meant.
 */
export function splitByCut(model: TrussModel, members: string[]): CutSplit {
  const parts = splitJoints(model, new Set(members));
  if (parts.length !== 2) {
    return {
      ok: false,
      reason: `Removing ${members.join(", ")} leaves ${parts.length === 1 ? "the truss in one piece" : `${parts.length} separate parts`}; a section must divide it into exactly two.`,
    };
  }
  const first = new Set(parts[0]);
  for (const id of members) {
    const m = model.members.find((x) => x.id === id);
    if (m && first.has(m.start) === first.has(m.end)) {
      return { ok: false, reason: `Member ${id} has both ends on the same side of the cut, so the section does not cut it.` };
    }
  }
  return { ok: true, sides: [parts[0], parts[1]] };
}
