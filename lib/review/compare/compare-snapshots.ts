import { compareCalcs } from "./compare-calcs";
import { compareText } from "./compare-text";
import type { Snapshot, SnapshotComparison } from "./snapshot";

/**
 * What changed from `a` (older) to `b` (newer): the calcs whose inputs or
 * results differ, with the exported values that moved, and the narrative
 * blocks added, removed or changed. Pure: no database, no clock.
 */
export function compareSnapshots(a: Snapshot, b: Snapshot): SnapshotComparison {
  return { from: a.label, to: b.label, calcs: compareCalcs(a, b), text: compareText(a.document, b.document) };
}
