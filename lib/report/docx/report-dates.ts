/** The date part of an ISO timestamp, as every sheet prints dates (YYYY-MM-DD). */
export function isoDay(value: string | null | undefined): string {
  if (!value) return "";
  return /^\d{4}-\d{2}-\d{2}/.test(value) ? value.slice(0, 10) : value;
}
