/** A stable anchor for a numbered heading: "h-3-2-section-cut". */
export function headingAnchor(number: string, text: string): string {
  const slug = text.toLowerCase().normalize("NFKD").replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 40);
  return `h-${number.replace(/\./g, "-")}${slug ? `-${slug}` : ""}`;
}

/** The anchor of a calc's block. */
export function calcAnchor(label: string): string {
  return `calc-${label}`;
}
