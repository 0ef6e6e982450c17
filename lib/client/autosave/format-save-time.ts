/**
 * A server timestamp as the author reads it beside the document: the clock time
 * today, the date and time otherwise. Null for a string that is not a date, so
 * a malformed answer shows "Saved" rather than "Invalid Date".
 */
export function formatSaveTime(iso: string, now: Date = new Date(), locale?: string): string | null {
  const at = new Date(iso);
  if (Number.isNaN(at.getTime())) return null;
  const time = at.toLocaleTimeString(locale, { hour: "2-digit", minute: "2-digit" });
  if (at.toDateString() === now.toDateString()) return time;
  return `${at.toLocaleDateString(locale, { day: "numeric", month: "short" })} ${time}`;
}
