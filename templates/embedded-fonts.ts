import { readFileSync } from "node:fs";
import { join } from "node:path";

/** Our faces: Source Serif 4 for text, Inter for headings, tables and the title block, JetBrains Mono for the fingerprint. */
const FACES = [
  { family: "PP Serif", file: "source-serif-4-latin-400-normal.woff2", weight: 400, style: "normal" },
  { family: "PP Serif", file: "source-serif-4-latin-400-italic.woff2", weight: 400, style: "italic" },
  { family: "PP Serif", file: "source-serif-4-latin-600-normal.woff2", weight: 600, style: "normal" },
  { family: "PP Serif", file: "source-serif-4-latin-700-normal.woff2", weight: 700, style: "normal" },
  { family: "PP Sans", file: "inter-latin-400-normal.woff2", weight: 400, style: "normal" },
  { family: "PP Sans", file: "inter-latin-500-normal.woff2", weight: 500, style: "normal" },
  { family: "PP Sans", file: "inter-latin-600-normal.woff2", weight: 600, style: "normal" },
  { family: "PP Sans", file: "inter-latin-700-normal.woff2", weight: 700, style: "normal" },
  { family: "PP Mono", file: "jetbrains-mono-latin-400-normal.woff2", weight: 400, style: "normal" },
  { family: "PP Mono", file: "jetbrains-mono-latin-500-normal.woff2", weight: 500, style: "normal" },
] as const;

let cached: string | undefined;

/** Where the repository's files are: the process runs from the repository root (web, worker, scripts, tests). */
function root(): string {
  return process.env.PANELPOINT_ROOT ?? process.cwd();
}

function dataUri(path: string): string {
  return `data:font/woff2;base64,${readFileSync(path).toString("base64")}`;
}

/**
 * @font-face rules for our fonts and KaTeX's, every font as a data: URI, so
 * the HTML is self-contained and Chromium embeds the same faces in the PDF
 * whatever is installed on the machine. Read once per process.
 */
export function embeddedFontCss(): string {
  if (cached) return cached;
  const ours = FACES.map(
    (f) => `@font-face{font-family:"${f.family}";font-style:${f.style};font-weight:${f.weight};font-display:block;src:url(${dataUri(join(root(), "fonts", f.file))}) format("woff2")}`,
  ).join("\n");
  const katexDir = join(root(), "node_modules", "katex", "dist");
  // Keep only the woff2 source of each KaTeX face, inlined; Chromium reads woff2.
  const katexCss = readFileSync(join(katexDir, "katex.min.css"), "utf8")
    // Our working never uses mathcal, mathfrak, mathscr, mathsf or texttt (lib/solve writes mathrm, mathit, text):
    // leaving those faces out keeps every export about 80 kB lighter for Chromium to parse.
    .replace(/@font-face\{[^}]*font-family:KaTeX_(Caligraphic|Fraktur|Script|SansSerif|Typewriter);[^}]*\}/g, "")
    .replace(
    /src:url\(fonts\/([^)]+\.woff2)\) format\("woff2"\)[^;}]*/g,
    (_m, file: string) => `src:url(${dataUri(join(katexDir, "fonts", file))}) format("woff2")`,
  );
  cached = `${ours}\n${katexCss}`;
  return cached;
}

let css: string | undefined;

/** The report's own stylesheets (templates/report.css and cover.css). */
export function reportCss(): string {
  css ??= ["report.css", "cover.css"].map((f) => readFileSync(join(root(), "templates", f), "utf8")).join("\n");
  return css;
}
