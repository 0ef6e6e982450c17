import type { SectionCutView } from "@/lib/calcs/section-cut/section-cut-view";
import { formatForce } from "../truss/format-force";

const LETTER = { tension: "T", compression: "C", zero: "zero" } as const;

/** The line a collapsed Section cut shows: "U2U3 = −150 kN (C) · … · agrees with T1". */
export function sectionCutSummary(view: SectionCutView | null): string | undefined {
  if (!view) return undefined;
  const forces = view.rows.map((r) => `${r.member} = ${formatForce(r.force, view.units.force)} (${LETTER[r.sense]})`);
  return [...forces, view.agrees ? `agrees with ${view.truss}` : `✕ differs from ${view.truss}`].join(" · ");
}
