import { escapeTex, texSymbol } from "../latex";

/** A variable as LaTeX: `F_y` → `F_{\mathrm{y}}`; a dotted reference keeps its calc label: `\mathrm{T1}{.}F_{…}`. */
export function texName(safeOrDotted: string): string {
  const dotted = safeOrDotted.replace("$", ".");
  const dot = dotted.indexOf(".");
  if (dot < 0) return texSymbol(dotted);
  return `\\mathrm{${escapeTex(dotted.slice(0, dot))}}{.}${texSymbol(dotted.slice(dot + 1))}`;
}
