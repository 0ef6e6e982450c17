import localFont from "next/font/local";

// Shipped in fonts/ and bundled by Next: nothing is fetched from a font service.
export const uiFont = localFont({
  src: [
    { path: "../../fonts/inter-latin-400-normal.woff2", weight: "400" },
    { path: "../../fonts/inter-latin-500-normal.woff2", weight: "500" },
    { path: "../../fonts/inter-latin-600-normal.woff2", weight: "600" },
    { path: "../../fonts/inter-latin-700-normal.woff2", weight: "700" },
  ],
  variable: "--font-ui",
  display: "swap",
});

export const docFont = localFont({
  src: [
    { path: "../../fonts/source-serif-4-latin-400-normal.woff2", weight: "400" },
    { path: "../../fonts/source-serif-4-latin-400-italic.woff2", weight: "400", style: "italic" },
    { path: "../../fonts/source-serif-4-latin-600-normal.woff2", weight: "600" },
    { path: "../../fonts/source-serif-4-latin-700-normal.woff2", weight: "700" },
  ],
  variable: "--font-doc",
  display: "swap",
});

export const numFont = localFont({
  src: [
    { path: "../../fonts/jetbrains-mono-latin-400-normal.woff2", weight: "400" },
    { path: "../../fonts/jetbrains-mono-latin-500-normal.woff2", weight: "500" },
  ],
  variable: "--font-num",
  display: "swap",
});
