import { formatNumber } from "./format-number";

export type DescribeDiagramOptions = {
  joints: number;
  members: number;
  supports: number;
  skippedMembers: readonly string[];
  loadCaseId?: string | null;
  forces?: Record<string, number>;
  unit: string;
};

/** The diagram in one or two sentences, for the SVG's <desc>: what a sighted reader takes in at a glance. */
export function describeDiagram(o: DescribeDiagramOptions): string {
  if (o.joints === 0) return "No joints have been entered yet.";
  const n = (count: number, word: string) => `${count} ${word}${count === 1 ? "" : "s"}`;
  let s = `Truss with ${n(o.joints, "joint")}, ${n(o.members, "member")} and ${n(o.supports, "support")}`;
  s += o.loadCaseId ? `; loads of case ${o.loadCaseId}.` : ".";
  if (o.skippedMembers.length > 0) s += ` Not drawn (joint missing or both ends at one point): ${o.skippedMembers.join(", ")}.`;
  const u = o.unit ? ` ${o.unit}` : "";
  const extreme = (sign: 1 | -1) => {
    let best: [string, number] | undefined;
    for (const [id, f] of Object.entries(o.forces ?? {})) {
      if (Number.isFinite(f) && sign * f > 0 && (!best || sign * f > sign * best[1])) best = [id, f];
    }
    return best;
  };
  const t = extreme(1);
  const c = extreme(-1);
  if (t) s += ` Largest tension ${formatNumber(t[1])}${u} in ${t[0]}.`;
  if (c) s += ` Largest compression ${formatNumber(-c[1])}${u} in ${c[0]}.`;
  return s;
}
