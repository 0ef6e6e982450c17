import { formatNumber } from "@/components/diagrams/format-number";

/** One hand-method force beside the stiffness solution: agreement, or the difference, flagged. */
export type Agreement = { ok: boolean | null; text: string };

/**
 * Words for how a hand result compares with the full solution: within
 * round-off, or the difference with both values so the checker can see it.
 */
export function describeAgreement(force: number, stiffness: number | null, agrees: boolean | null, unit: string): Agreement {
  if (stiffness === null || agrees === null) return { ok: null, text: "No stiffness value to compare with" };
  if (agrees) return { ok: true, text: "✓ Agrees with the stiffness solution within round-off" };
  return { ok: false, text: `✕ Differs by ${formatNumber(force - stiffness, 4)} ${unit} from the stiffness solution (${formatNumber(stiffness, 4)} ${unit})` };
}
