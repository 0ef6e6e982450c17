import type { AsceTable } from "./asce-template";

const LR_S_R = [{ Lr: 0.5 }, { S: 0.5 }, { R: 0.5 }];

/**
 * ASCE/SEI 7-16 §2.3.1, basic combinations for strength design (LRFD).
 * Seismic combinations 6 and 7 (§2.3.6) and the flood, atmospheric-ice and
 * self-straining combinations are not generated.
 */
export const asce716Lrfd: AsceTable = {
  title: "basic combinations for strength design (LRFD)",
  clause: "ASCE/SEI 7-16 \u00a72.3.1",
  templates: [
    { label: "1", expression: "1.4D", terms: [[{ D: 1.4 }]] },
    { label: "2", expression: "1.2D + 1.6L + 0.5(Lr or S or R)", terms: [[{ D: 1.2 }], [{ L: 1.6 }], LR_S_R] },
    {
      label: "3",
      expression: "1.2D + 1.6(Lr or S or R) + (L or 0.5W)",
      terms: [[{ D: 1.2 }], [{ Lr: 1.6 }, { S: 1.6 }, { R: 1.6 }], [{ L: 1.0 }, { W: 0.5 }]],
    },
    { label: "4", expression: "1.2D + 1.0W + L + 0.5(Lr or S or R)", terms: [[{ D: 1.2 }], [{ W: 1.0 }], [{ L: 1.0 }], LR_S_R] },
    { label: "5", expression: "0.9D + 1.0W", terms: [[{ D: 0.9 }], [{ W: 1.0 }]] },
  ],
  // §2.3.1 Exception 1 (L factor 0.5 in 3 and 4 for most occupancies with L0 ≤ 100 psf) is not applied: 1.0 is conservative.
  omitted:
    "Seismic combinations (\u00a72.3.6), flood, atmospheric-ice and self-straining combinations are not generated; the 0.5L of \u00a72.3.1 Exception 1 is not applied (1.0L is conservative).",
};
