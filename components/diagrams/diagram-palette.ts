/**
 * The diagram's colours as literal hex values. The SVG is also serialised into
 * exported PDF and DOCX sheets where the Tailwind stylesheet is absent, so it
 * cannot rely on `stroke-tension` classes; these mirror tailwind.config.ts.
 */
export const PALETTE = {
  ink: "#1f2a37",
  inkSoft: "#4a5563",
  inkFaint: "#7b8591",
  paper: "#f6f4ef",
  paperRaised: "#fbfaf7",
  rule: "#d9d4c7",
  ruleStrong: "#b9b2a1",
  verdigris: "#2f6f6a",
  verdigrisLight: "#e3efed",
  tension: "#2b5c8a",
  compression: "#a4452c",
  caution: "#8a6414",
  cautionLight: "#f5ecd6",
} as const;

/** Opacity of what lies outside a free body: present for orientation, clearly not part of it. */
export const FADED_OPACITY = 0.22;
