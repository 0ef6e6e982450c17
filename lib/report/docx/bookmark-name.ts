/**
 * Word bookmark names: a letter first, then letters, digits and underscores,
 * at most 40 characters. Headings are bookmarked under their anchor so "#…"
 * links in the text (and the response letter) jump to them.
 */
export function bookmarkName(anchor: string): string {
  const cleaned = anchor.replace(/[^A-Za-z0-9_]/g, "_");
  return `h_${cleaned}`.slice(0, 40);
}
