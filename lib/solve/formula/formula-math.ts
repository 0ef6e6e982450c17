import { create, createUnitDependencies, parseDependencies, unitDependencies } from "mathjs";

/**
 * The mathjs instance the formula engine reads expressions and units with.
 * A private instance, so the units we add or correct never leak into other
 * users of mathjs; `predictable` keeps sqrt of a negative number real (NaN,
 * which we then report) instead of turning it into a complex number.
 */
export const formulaMath = create({ parseDependencies, createUnitDependencies, unitDependencies }, { predictable: true });

// mathjs rounds kip (4448.2216 N) and psi (6894.75729276459 Pa) while its lbf is
// exact (4.4482216152605 N); tying both to lbf keeps 1 kip = 1000 lbf and
// 1 ksi = 1000 psi exact, as NIST SP 811 defines them.
formulaMath.createUnit("kip", { definition: "1000 lbf", aliases: ["kips"] }, { override: true });
formulaMath.createUnit("psi", { definition: "1 lbf/in^2" }, { override: true });

// Units US structural engineers write every day that mathjs does not define.
formulaMath.createUnit({
  ksi: "1 kip/in^2",
  ksf: "1 kip/ft^2",
  psf: "1 lbf/ft^2",
  klf: "1 kip/ft",
  plf: "1 lbf/ft",
  pcf: "1 lbf/ft^3",
});
