/** ψ0 (combination), ψ1 (frequent) and ψ2 (quasi-permanent) of one variable action. */
export type PsiValues = { psi0: number; psi1: number; psi2: number; description: string };

/** Action categories of EN 1990 Table A1.1 (buildings). */
export type PsiCategory =
  | "A"
  | "B"
  | "C"
  | "D"
  | "E"
  | "F"
  | "G"
  | "H"
  | "snow-nordic"
  | "snow-above-1000m"
  | "snow-up-to-1000m"
  | "wind"
  | "temperature";

/**
 * Recommended ψ values for buildings, EN 1990:2002 Table A1.1 (a National
 * Annex may set others). Categories A–H are those of EN 1991-1-1.
 */
export const psiFactors: Readonly<Record<PsiCategory, PsiValues>> = {
  A: { psi0: 0.7, psi1: 0.5, psi2: 0.3, description: "Imposed, category A: domestic, residential" },
  B: { psi0: 0.7, psi1: 0.5, psi2: 0.3, description: "Imposed, category B: office" },
  C: { psi0: 0.7, psi1: 0.7, psi2: 0.6, description: "Imposed, category C: congregation areas" },
  D: { psi0: 0.7, psi1: 0.7, psi2: 0.6, description: "Imposed, category D: shopping areas" },
  E: { psi0: 1.0, psi1: 0.9, psi2: 0.8, description: "Imposed, category E: storage areas" },
  F: { psi0: 0.7, psi1: 0.7, psi2: 0.6, description: "Imposed, category F: traffic, vehicle weight \u2264 30 kN" },
  G: { psi0: 0.7, psi1: 0.5, psi2: 0.3, description: "Imposed, category G: traffic, 30 kN < vehicle weight \u2264 160 kN" },
  H: { psi0: 0, psi1: 0, psi2: 0, description: "Imposed, category H: roofs" },
  "snow-nordic": { psi0: 0.7, psi1: 0.5, psi2: 0.2, description: "Snow: Finland, Iceland, Norway, Sweden" },
  "snow-above-1000m": { psi0: 0.7, psi1: 0.5, psi2: 0.2, description: "Snow: other CEN members, site altitude H > 1000 m" },
  "snow-up-to-1000m": { psi0: 0.5, psi1: 0.2, psi2: 0, description: "Snow: other CEN members, site altitude H \u2264 1000 m" },
  wind: { psi0: 0.6, psi1: 0.2, psi2: 0, description: "Wind loads on buildings (EN 1991-1-4)" },
  temperature: { psi0: 0.6, psi1: 0.5, psi2: 0, description: "Temperature (non-fire) in buildings (EN 1991-1-5)" },
};

/**
 * ψ0 used for a variable action that carries no override: imposed loads as
 * categories A–D (0.7; storage E is 1.0 and roofs H are 0, so enter those),
 * snow at sites up to 1000 m, wind.
 */
export const defaultPsi0: Readonly<Record<"Q" | "S" | "W", number>> = {
  Q: psiFactors.A.psi0,
  S: psiFactors["snow-up-to-1000m"].psi0,
  W: psiFactors.wind.psi0,
};
