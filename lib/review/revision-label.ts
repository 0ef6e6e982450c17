export type RevisionLabelOptions = { scheme: "numeric" | "alpha"; /** 0 for the first revision. */ number: number };

/** "0", "1", "2" … or "A", "B", … "Z", "AA" …, as the project's revision scheme says. */
export function revisionLabel({ scheme, number }: RevisionLabelOptions): string {
  if (scheme === "numeric") return String(number);
  let n = number + 1;
  let out = "";
  while (n > 0) {
    const r = (n - 1) % 26;
    out = String.fromCharCode(65 + r) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}
