import { SolveError } from "../errors";
import type { LoadCase, TrussModel } from "../types";

/** The named load case, or INVALID at `loadCase` naming the cases that exist. */
export function findLoadCase(model: TrussModel, id: string): LoadCase {
  const found = model.loadCases.find((c) => c.id === id);
  if (!found) {
    const names = model.loadCases.map((c) => c.id).join(", ") || "none";
    throw new SolveError("INVALID", `Load case "${id}" is not in the model (cases: ${names}).`, { path: "loadCase" });
  }
  return found;
}
