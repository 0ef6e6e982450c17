import katex from "katex";
import { mml2omml } from "mathml2omml";

export type OmmlConversion = { ok: true; omml: string } | { ok: false; reason: string };

const OMML_ROOT = /^<m:oMath[\s>]/;

/**
 * TeX → MathML (KaTeX) → OMML (mathml2omml): the `<m:oMath>` element Word
 * edits as a native equation. KaTeX runs with `throwOnError: true` here
 * because with `false` an unknown command comes back as red text inside a
 * valid <math>, which would pass for a converted equation; a parse error must
 * instead reach the caller, which prints the TeX and counts the failure.
 */
export function texToOmml(tex: string): OmmlConversion {
  if (!tex.trim()) return { ok: false, reason: "empty equation" };
  let markup: string;
  try {
    markup = katex.renderToString(tex, { output: "mathml", throwOnError: true, strict: "ignore" });
  } catch (error) {
    return { ok: false, reason: error instanceof Error ? error.message : String(error) };
  }
  const math = markup.match(/<math[\s\S]*<\/math>/);
  if (!math) return { ok: false, reason: "KaTeX gave no <math> element" };
  let omml: string;
  try {
    omml = mml2omml(prepareMathml(math[0])).trim();
  } catch (error) {
    return { ok: false, reason: `MathML to OMML: ${error instanceof Error ? error.message : String(error)}` };
  }
  if (!OMML_ROOT.test(omml) || !omml.includes("<m:r>")) return { ok: false, reason: "MathML to OMML gave no equation" };
  return { ok: true, omml };
}

/**
 * Two adjustments mathml2omml needs: the TeX annotation is dropped (the
 * converter does not know <annotation> and warns on every equation), and the
 * whitespace-only <mtext> KaTeX writes for `\,` `\;` becomes an <mspace>,
 * because the converter trims text and would lose the gap between a number
 * and its unit.
 */
function prepareMathml(mathml: string): string {
  return mathml
    .replace(/<annotation[\s\S]*?<\/annotation>/g, "")
    .replace(/<mtext>[\s\u00a0\u2000-\u200b\u205f\u3000]+<\/mtext>/g, '<mspace width="0.2em"/>');
}
