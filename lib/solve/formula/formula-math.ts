import { create, createUnitDependencies, parseDependencies, unitDependencies } from "mathjs";

/**
 * The mathjs instance the formula engine reads expressions and units with.
 * A private instance, so the US loading units we add never leak into other
 * users of mathjs; `predictable` keeps sqrt of a negative number real (NaN,
 * which we then report) instead of turning it into a complex number.
 */
export const formulaMath = create({ parseDependencies, createUnitDependencies, unitDependencies }, { predictable: true });

// Units US structural engineers write every day that mathjs does not define.
formulaMath.createUnit({
  ksi: "1000 psi",
  ksf: "1 kip/ft^2",
  psf: "1 lbf/ft^2",
  klf: "1 kip/ft",
  plf: "1 lbf/ft",
  pcf: "1 lbf/ft^3",
});
