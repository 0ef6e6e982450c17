/**
 * A value name other calcs can write after the dot (`T1.F_U1L2_G`): the parts
 * joined by `_`, with anything but letters, digits and `_` turned into `_`,
 * so a case id such as "W-left" still gives a readable, legal name.
 */
export function exportName(...parts: string[]): string {
  return parts.map((p) => p.replace(/[^A-Za-z0-9_]/g, "_")).join("_");
}
