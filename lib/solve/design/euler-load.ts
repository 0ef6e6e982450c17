import { z } from "zod";
import { parseInput } from "./parse-input";

/** Inputs of the Euler buckling load; E·I/L² must give a force (e.g. ksi·in⁴/in² → kip). */
export type EulerLoadOptions = {
  /** Modulus of elasticity. */
  E: number;
  /** Second moment of area about the buckling axis. */
  I: number;
  /** Member length. */
  L: number;
  /** Effective length factor, default 1 (pinned–pinned). */
  K?: number;
};

const schema = z.object({
  E: z.number().positive(),
  I: z.number().positive(),
  L: z.number().positive(),
  K: z.number().positive().default(1),
});

/** Elastic critical load of a pin-ended strut, Pe = π²EI/(KL)² (closed form, Euler 1744). */
export function eulerLoad(options: EulerLoadOptions): number {
  const { E, I, L, K } = parseInput(schema, options);
  return (Math.PI ** 2 * E * I) / (K * L) ** 2;
}
