import { isSolveError, resolvePanel, type Panel, type TrussModel } from "@/lib/solve";

/**
 * The panels of the bottom chord, left to right, as the core numbers them
 * (from 0). A truss whose bottom chord is not level has none; it is cut by
 * picking members instead.
 */
export function listPanels(model: TrussModel): Panel[] {
  const out: Panel[] = [];
  for (let i = 0; i < model.joints.length; i++) {
    try {
      out.push(resolvePanel(model, i));
    } catch (e) {
      // Past the last panel the core says so with an INVALID error: that is the end of the list.
      if (!isSolveError(e)) throw e;
      break;
    }
  }
  return out;
}
