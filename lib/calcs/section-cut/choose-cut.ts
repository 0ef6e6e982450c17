import { proposeCuts, SolveError, type TrussModel } from "../../solve";
import type { SectionCutInputs } from "./section-cut-inputs";

/** The members to cut and the side to keep: as entered, or the simplest proposed section. */
export type ChosenCut = { members: string[]; keep: string; proposed: boolean; description: string | null };

/**
 * Uses the author's members when given; otherwise asks for proposals through
 * `panel` (or through the whole truss, when it is small) and takes the first,
 * which is the simplest to check by hand. Throws SolveError INVALID on
 * `members` or `panel` when nothing can be proposed.
 */
export function chooseCut(model: TrussModel, inputs: SectionCutInputs): ChosenCut {
  if (inputs.members.length > 0) {
    return { members: inputs.members, keep: inputs.keep || model.joints[0].id, proposed: false, description: null };
  }
  let proposals;
  try {
    proposals = proposeCuts(model, inputs.panel === undefined ? {} : { panel: inputs.panel });
  } catch (e) {
    // The core names its option `member` when the truss is too large to search; here that is the members list.
    if (e instanceof SolveError && e.path === "member") throw new SolveError("INVALID", e.message, { path: "members" });
    throw e;
  }
  const first = proposals[0];
  if (!first) {
    const where = inputs.panel === undefined ? "through this truss" : `through panel ${String(inputs.panel)}`;
    throw new SolveError("INVALID", `No section of two or three members ${where} can be solved by one equation per member; pick the members to cut.`, { path: "members" });
  }
  return { members: first.members, keep: inputs.keep || first.keep, proposed: true, description: first.description };
}
