/** How a standard reference reads in print: "EN 1993-1-1:2005 §6.3.1", or "EN 1990:2002 Eq. 6.10" when the clause names its own kind. */
export function formatStandardReference(ref: { code: string; edition: string; clause: string }): string {
  const code = ref.edition ? `${ref.code}:${ref.edition}` : ref.code;
  const clause = ref.clause.trim();
  if (!clause) return code;
  return /^\d/.test(clause) ? `${code} §${clause}` : `${code} ${clause}`;
}
