import { BODY_FONT, CODE_FONT, HEADING_FONT } from "./docx-fonts";

export type PreparedSvg = { svg: string; width: number; height: number };

/**
 * Makes the editor's diagram markup a standalone SVG file: React's static
 * markup has no xmlns (a browser page does not need one, an SVG part does),
 * the diagram sizes itself by CSS and viewBox only, and its fonts are CSS
 * variables that exist only in the app's stylesheet.
 */
export function prepareSvg(markup: string): PreparedSvg | null {
  const match = markup.match(/<svg[\s\S]*<\/svg>/);
  if (!match) return null;
  let svg = match[0];
  const viewBox = svg.match(/viewBox="\s*([-\d.e]+)[\s,]+([-\d.e]+)[\s,]+([-\d.e]+)[\s,]+([-\d.e]+)\s*"/);
  const openTag = svg.match(/^<svg[^>]*>/)![0];
  const attr = (name: string) => Number.parseFloat(openTag.match(new RegExp(`\\s${name}="([\\d.]+)`))?.[1] ?? "");
  const width = attr("width") || (viewBox ? Number(viewBox[3]) : 0);
  const height = attr("height") || (viewBox ? Number(viewBox[4]) : 0);
  if (!(width > 0) || !(height > 0)) return null;

  let tag = openTag.replace(/\sstyle="[^"]*"/, "");
  if (!/\sxmlns=/.test(tag)) tag = tag.replace("<svg", '<svg xmlns="http://www.w3.org/2000/svg"');
  if (!/\swidth=/.test(tag)) tag = tag.replace("<svg", `<svg width="${width}" height="${height}"`);
  tag = tag.replace("<svg", `<svg font-family="${HEADING_FONT}, sans-serif"`);
  svg = tag + svg.slice(openTag.length);
  svg = svg
    .replace(/var\(--font-num\)/g, `'${CODE_FONT}'`)
    .replace(/var\(--font-ui\)/g, `'${HEADING_FONT}'`)
    .replace(/var\(--font-(serif|text|body)\)/g, `'${BODY_FONT}'`)
    .replace(/var\(--[\w-]+\)/g, "currentColor");
  return { svg, width, height };
}
