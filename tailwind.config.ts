import type { Config } from "tailwindcss";

/**
 * Panelpoint's palette: warm drafting paper, graphite ink, a verdigris accent.
 * Tension and compression have their own hues, always paired with a word or a
 * line style so colour is never the only signal.
 */
const config: Config = {
  content: ["./app/**/*.{ts,tsx}", "./components/**/*.{ts,tsx}"],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: "#f6f4ef", raised: "#fbfaf7", sunk: "#eeebe3" },
        ink: { DEFAULT: "#1f2a37", soft: "#4a5563", faint: "#7b8591" },
        rule: { DEFAULT: "#d9d4c7", strong: "#b9b2a1" },
        verdigris: { DEFAULT: "#2f6f6a", dark: "#22524e", light: "#e3efed" },
        tension: { DEFAULT: "#2b5c8a", light: "#e4edf6" },
        compression: { DEFAULT: "#a4452c", light: "#f6e6e0" },
        caution: { DEFAULT: "#8a6414", light: "#f5ecd6" },
      },
      fontFamily: {
        sans: ["var(--font-ui)", "system-ui", "sans-serif"],
        serif: ["var(--font-doc)", "Georgia", "serif"],
        mono: ["var(--font-num)", "ui-monospace", "monospace"],
      },
    },
  },
};

export default config;
