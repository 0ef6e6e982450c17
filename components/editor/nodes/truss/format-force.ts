import { formatNumber } from "@/components/diagrams/format-number";
import type { ForceSense } from "@/lib/calcs/truss/truss-view";

/**
 * A force as the tables print it: four significant figures (enough to
 * check a hand calc against), a true minus sign, and its unit.
 */
export function formatForce(value: number, unit: string): string {
  return `${formatNumber(value, 4)} ${unit}`;
}

/** Tension or compression in words with the letter engineers write beside a force. */
export function senseWord(sense: ForceSense): string {
  return sense === "tension" ? "tension (T)" : sense === "compression" ? "compression (C)" : "zero force";
}
