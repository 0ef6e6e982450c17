/** "2 Dec 2026, 09:14" in the reader's locale and zone: when a mark or reply was made. */
export function formatWhen(iso: string | null): string {
  if (!iso) return "";
  return new Date(iso).toLocaleString(undefined, { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" });
}
