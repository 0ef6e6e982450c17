/** A label such as a member or joint id, upright in LaTeX, with LaTeX's special characters escaped. */
export function texLabel(label: string): string {
  const escaped = label.replace(/[\\{}$&#%^~_]/g, (c) => (c === "\\" ? "\\backslash " : c === "^" || c === "~" ? "" : `\\${c}`));
  return `\\mathrm{${escaped}}`;
}
