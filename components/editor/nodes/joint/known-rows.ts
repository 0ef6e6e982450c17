/** A member force already known, as a row of the known-forces table. */
export type KnownRow = { member: string; force?: number };

export function knownRows(known: Readonly<Record<string, number>>): KnownRow[] {
  return Object.entries(known).map(([member, force]) => ({ member, force }));
}

/**
 * Rows back to the known forces. A row still being filled in (no member or
 * no force yet) is left out rather than sent as a zero force, which would be
 * a silent wrong input; the table keeps showing it until it is complete.
 */
export function knownFromRows(rows: readonly KnownRow[]): { known: Record<string, number>; incomplete: number } {
  const known: Record<string, number> = {};
  let incomplete = 0;
  for (const r of rows) {
    const member = r.member.trim();
    if (member === "" || r.force === undefined) incomplete += 1;
    else known[member] = r.force;
  }
  return { known, incomplete };
}
