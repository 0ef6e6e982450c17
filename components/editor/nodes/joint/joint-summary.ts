import type { JointView } from "@/lib/calcs/joint/joint-view";
import { formatForce } from "../truss/format-force";

const LETTER = { tension: "T", compression: "C", zero: "zero" } as const;

/** The line a collapsed Joint calc shows: the forces found (or how many), and the check against the truss. */
export function jointSummary(view: JointView | null): string | undefined {
  if (!view) return undefined;
  const verdict = view.agrees ? `agrees with ${view.truss}` : `✕ differs from ${view.truss}`;
  if (view.mode === "sequence") {
    const extent = view.complete ? `${view.order.length} joints in order` : `stopped after ${view.order.length} joints`;
    return `${extent}, ${view.rows.length} member forces, case ${view.loadCase} · ${verdict}`;
  }
  const forces = view.rows.map((r) => `${r.member} = ${formatForce(r.force, view.units.force)} (${LETTER[r.sense]})`);
  return [`Joint ${view.joint}, case ${view.loadCase}`, ...forces, verdict].join(" · ");
}
