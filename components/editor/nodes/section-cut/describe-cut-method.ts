import { formatNumber } from "@/components/diagrams/format-number";
import type { CutMemberRow } from "@/lib/calcs/section-cut/section-cut-view";

/**
 * How a cut member's force was found, in words: the moment point (a joint,
 * a support, or a point off the truss where the other two lines of action
 * meet), or a force sum across two parallel members.
 */
export function describeCutMethod(row: CutMemberRow, lengthUnit: string): string {
  if (row.method === "force sum" || !row.pivot) return "Force sum across the two parallel members";
  const kind = row.pivotKind;
  if (kind?.kind === "joint") return `Moments about joint ${kind.joint}`;
  if (kind?.kind === "support") return `Moments about support ${kind.joint}`;
  return `Moments about (${formatNumber(row.pivot.x)}, ${formatNumber(row.pivot.y)}) ${lengthUnit}, off the truss, where the other two lines of action meet`;
}
