import { isSolveError, proposeCuts, type ProposedCut, type TrussModel } from "@/lib/solve";

export type CutProposals = { proposals: ProposedCut[]; problem: string | null };

/** How many proposals to offer: the simplest few are the ones worth checking by hand. */
const SHOWN = 4;

/**
 * The simplest solvable sections through a panel (or, for a small truss,
 * anywhere), from the core's proposer; a panel that has none, or a truss too
 * large to search without one, comes back as words.
 */
export function cutProposals(model: TrussModel, panel: number | string | undefined): CutProposals {
  try {
    const proposals = proposeCuts(model, panel === undefined ? {} : { panel }).slice(0, SHOWN);
    const where = panel === undefined ? "through this truss" : `through panel ${String(panel)}`;
    return { proposals, problem: proposals.length === 0 ? `No section of two or three members ${where} can be solved one equation per member.` : null };
  } catch (e) {
    if (!isSolveError(e)) throw e;
    return { proposals: [], problem: e.message };
  }
}
