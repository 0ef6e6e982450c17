import type { Step } from "@/lib/solve";

/**
 * The calc's working split per member. The runtime writes each member's
 * checks after a header step whose words begin "Member <id>, "; the comma
 * keeps U1 from claiming the steps of U1U2. Steps before any header (none
 * today) are kept under "".
 */
export function stepsByMember(steps: readonly Step[], members: readonly string[]): Map<string, Step[]> {
  const out = new Map<string, Step[]>();
  // Longest ids first, so that the header of "U1U2" is never read as the header of "U1".
  const ids = [...members].sort((a, b) => b.length - a.length);
  let current = "";
  for (const step of steps) {
    const header = ids.find((id) => step.text?.startsWith(`Member ${id}, `));
    if (header !== undefined) current = header;
    const list = out.get(current) ?? [];
    list.push(step);
    out.set(current, list);
  }
  return out;
}
