import type { AsceTable } from "./asce-template";

const LR_S_R = [{ Lr: 1.0 }, { S: 1.0 }, { R: 1.0 }];
const LR_S_R_075 = [{ Lr: 0.75 }, { S: 0.75 }, { R: 0.75 }];

/**
 * ASCE/SEI 7-16 §2.4.1, basic combinations for allowable stress design.
 * Seismic combinations 8–10 (§2.4.5) are not generated.
 */
export const asce716Asd: AsceTable = {
  title: "basic combinations for allowable stress design (ASD)",
  clause: "ASCE/SEI 7-16 \u00a72.4.1",
  templates: [
    { label: "1", expression: "D", terms: [[{ D: 1.0 }]] },
    { label: "2", expression: "D + L", terms: [[{ D: 1.0 }], [{ L: 1.0 }]] },
    { label: "3", expression: "D + (Lr or S or R)", terms: [[{ D: 1.0 }], LR_S_R] },
    { label: "4", expression: "D + 0.75L + 0.75(Lr or S or R)", terms: [[{ D: 1.0 }], [{ L: 0.75 }], LR_S_R_075] },
    { label: "5", expression: "D + 0.6W", terms: [[{ D: 1.0 }], [{ W: 0.6 }]] },
    {
      label: "6",
      expression: "D + 0.75L + 0.75(0.6W) + 0.75(Lr or S or R)",
      terms: [[{ D: 1.0 }], [{ L: 0.75 }], [{ W: 0.45 }], LR_S_R_075],
    },
    { label: "7", expression: "0.6D + 0.6W", terms: [[{ D: 0.6 }], [{ W: 0.6 }]] },
  ],
  omitted: "Seismic combinations (\u00a72.4.5), flood, atmospheric-ice and self-straining combinations are not generated.",
};
