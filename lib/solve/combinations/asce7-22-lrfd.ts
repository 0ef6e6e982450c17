import type { AsceTable } from "./asce-template";

const SNOW_NOTE =
  "ASCE 7-22 maps strength-level ground snow loads: S takes 1.0 as the principal load (was 1.6) and 0.5 \u00d7 0.3 = 0.15 as a companion (from memory).";
const LR_S_R = [{ Lr: 0.5 }, { S: 0.15 }, { R: 0.5 }];

/**
 * ASCE/SEI 7-22 §2.3.1, basic combinations for strength design (LRFD). Against
 * 7-16 the snow factors change because snow loads are now strength level;
 * the rest of the set is unchanged. The companion 0.3S is from memory; tornado
 * (W_T) and seismic combinations are not generated.
 */
export const asce722Lrfd: AsceTable = {
  title: "basic combinations for strength design (LRFD)",
  clause: "ASCE/SEI 7-22 \u00a72.3.1",
  templates: [
    { label: "1", expression: "1.4D", terms: [[{ D: 1.4 }]] },
    {
      label: "2",
      expression: "1.2D + 1.6L + 0.5(Lr or 0.3S or R)",
      terms: [[{ D: 1.2 }], [{ L: 1.6 }], LR_S_R],
      fromMemory: SNOW_NOTE,
    },
    {
      label: "3",
      expression: "1.2D + (1.6Lr or 1.0S or 1.6R) + (L or 0.5W)",
      terms: [[{ D: 1.2 }], [{ Lr: 1.6 }, { S: 1.0 }, { R: 1.6 }], [{ L: 1.0 }, { W: 0.5 }]],
      fromMemory: SNOW_NOTE,
    },
    {
      label: "4",
      expression: "1.2D + 1.0W + L + 0.5(Lr or 0.3S or R)",
      terms: [[{ D: 1.2 }], [{ W: 1.0 }], [{ L: 1.0 }], LR_S_R],
      fromMemory: SNOW_NOTE,
    },
    { label: "5", expression: "0.9D + 1.0W", terms: [[{ D: 0.9 }], [{ W: 1.0 }]] },
  ],
  omitted:
    "Tornado (W_T) and seismic combinations, flood, ice and self-straining combinations are not generated; the 0.5L exception is not applied (1.0L is conservative). " +
    SNOW_NOTE,
};
