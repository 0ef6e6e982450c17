import type { TrussView } from "@/lib/calcs/truss/truss-view";
import { formatForce } from "./format-force";

type Extreme = { member: string; force: number; caseId: string };

/**
 * The line a collapsed Truss calc shows, e.g. "Stable, determinate · max
 * tension 286.4 kN (L2L3) · max compression −322.2 kN (U2U3) in case Q";
 * the case goes on each extreme when they come from different cases.
 */
export function trussSummary(view: TrussView | null | undefined): string {
  if (!view) return "Not solved: fix the marked inputs first.";
  if (!view.stable) return view.stability.startsWith("Unstable") ? "Unstable: see the message above." : "Not solved: fix the marked inputs first.";
  const state = view.classification === "indeterminate" ? `Stable, indeterminate to degree ${view.counts.m + view.counts.r - 2 * view.counts.j}` : "Stable, determinate";
  let tension: Extreme | null = null;
  let compression: Extreme | null = null;
  // A symmetric truss has equal forces that differ in round-off only; the first of them is named, as a reader would.
  const beyond = (a: number, b: number) => Math.abs(a) > Math.abs(b) * (1 + 1e-9);
  for (const c of view.cases) {
    for (const f of c.forces) {
      if (f.sense === "tension" && (!tension || beyond(f.force, tension.force))) tension = { member: f.member, force: f.force, caseId: c.id };
      if (f.sense === "compression" && (!compression || beyond(f.force, compression.force))) compression = { member: f.member, force: f.force, caseId: c.id };
    }
  }
  if (!tension && !compression) return view.cases.length === 0 ? `${state} · no load cases yet` : `${state} · every member at zero force`;
  const sameCase = tension && compression ? tension.caseId === compression.caseId : true;
  const part = (word: string, e: Extreme | null) => (e ? `max ${word} ${formatForce(e.force, view.units.force)} (${e.member}${sameCase ? "" : `, case ${e.caseId}`})` : `no ${word}`);
  const caseId = (tension ?? compression)?.caseId;
  return `${state} · ${part("tension", tension)} · ${part("compression", compression)}${sameCase ? ` in case ${caseId}` : ""}`;
}
