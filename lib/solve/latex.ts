/**
 * Number and quantity formatting for typeset steps. Values are rounded for
 * display only; callers keep the unrounded numbers in their results.
 */

/** Significant figures used for displayed values unless a step asks otherwise (common practice: 3–4). */
export const DISPLAY_SIG_FIGS = 4;

/** A number for LaTeX: rounded to `sig` significant figures, minus sign typeset, no exponent for ordinary magnitudes. */
export function texNum(x: number, sig = DISPLAY_SIG_FIGS): string {
  if (!Number.isFinite(x)) return "\\text{n/a}";
  if (x === 0 || Math.abs(x) < 1e-12) return "0";
  const abs = Math.abs(x);
  if (abs >= 1e7 || abs < 1e-4) {
    const [m, e] = x.toExponential(sig - 1).split("e");
    return `${trimZeros(m).replace("-", "-")} \\times 10^{${Number(e)}}`;
  }
  const digits = Math.max(0, sig - 1 - Math.floor(Math.log10(abs)));
  const s = trimZeros(x.toFixed(Math.min(digits, 12)));
  return s === "-0" ? "0" : s;
}

/** A number wrapped in parentheses when negative, for substitution into products. */
export function texNumParen(x: number, sig = DISPLAY_SIG_FIGS): string {
  const s = texNum(x, sig);
  return x < 0 && s !== "0" ? `(${s})` : s;
}

/** A quantity: number, thin space, upright unit (`kN·m` style units are written with `\cdot`). */
export function texQty(x: number, unit: string, sig = DISPLAY_SIG_FIGS): string {
  const u = unit.trim();
  if (!u) return texNum(x, sig);
  return `${texNum(x, sig)}\\,\\mathrm{${texUnit(u)}}`;
}

/** A unit string such as `kN m`, `kN*m`, `mm^2` or `kN/m` in LaTeX (upright, `\cdot` between factors). */
export function texUnit(unit: string): string {
  return unit
    .trim()
    .replace(/\s*\*\s*|\s+/g, "\\cdot ")
    .replace(/\^(-?\d+)/g, "^{$1}");
}

/** A name such as `F_U1L2` or `phiPn` as a LaTeX symbol; subscripts after the first underscore. */
export function texSymbol(name: string): string {
  const [head, ...rest] = name.split("_");
  const greek: Record<string, string> = {
    alpha: "\\alpha", beta: "\\beta", gamma: "\\gamma", delta: "\\delta", Delta: "\\Delta",
    theta: "\\theta", lambda: "\\lambda", mu: "\\mu", phi: "\\phi", Phi: "\\Phi", psi: "\\psi",
    sigma: "\\sigma", tau: "\\tau", chi: "\\chi", rho: "\\rho", epsilon: "\\varepsilon", omega: "\\omega",
  };
  const h = greek[head] ?? (head.length > 1 ? `\\mathit{${escapeTex(head)}}` : escapeTex(head));
  return rest.length ? `${h}_{\\mathrm{${escapeTex(rest.join(","))}}}` : h;
}

/** Escapes characters that LaTeX treats specially inside \text{} or \mathrm{}. */
export function escapeTex(s: string): string {
  return s.replace(/[\\{}$&#%^~_]/g, (c) => (c === "\\" ? "\\backslash " : c === "^" || c === "~" ? "" : `\\${c}`));
}

/** "T" or "C" with the word, for a member force (tension positive). */
export function tensionOrCompression(force: number, tolerance = 1e-9): "tension" | "compression" | "zero" {
  if (Math.abs(force) <= tolerance) return "zero";
  return force > 0 ? "tension" : "compression";
}

function trimZeros(s: string): string {
  return s.includes(".") ? s.replace(/0+$/, "").replace(/\.$/, "") : s;
}
