import type { JointLoad, TrussModel } from "@/lib/solve";

/**
 * The loads to draw: those of the named case, of the first case when no case is
 * named, none for `null` (geometry only) or for a case that no longer exists.
 */
export function caseLoads(model: TrussModel, loadCaseId: string | null | undefined): JointLoad[] {
  if (loadCaseId === null) return [];
  const cases = model.loadCases ?? [];
  const chosen = loadCaseId === undefined ? cases[0] : cases.find((c) => c.id === loadCaseId);
  return chosen?.loads ?? [];
}
