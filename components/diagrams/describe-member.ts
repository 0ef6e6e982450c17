import { formatNumber } from "./format-number";
import type { ForceSense } from "./member-style";

export type DescribeMemberOptions = {
  id: string;
  start: string;
  end: string;
  sense: ForceSense;
  force?: number;
  unit: string;
  selected?: boolean;
  invalid?: boolean;
};

/** A member in words, for screen readers and the SVG tooltip: "Member U2, J3 to J5, compression 41.6 kN". */
export function describeMember({ id, start, end, sense, force, unit, selected, invalid }: DescribeMemberOptions): string {
  const parts = [`Member ${id}, ${start} to ${end}`];
  const u = unit ? ` ${unit}` : "";
  if (sense === "zero") parts.push("zero force");
  else if (sense !== "unknown" && force !== undefined) parts.push(`${sense} ${formatNumber(Math.abs(force))}${u}`);
  if (selected) parts.push("selected");
  if (invalid) parts.push("has an input error");
  return parts.join(", ");
}
