import type { GeneratorShape } from "./generator-form";

const NAMES: Record<GeneratorShape, string> = {
  pratt: "Pratt",
  howe: "Howe",
  warren: "Warren",
  "warren-verticals": "Warren with verticals",
  k: "K truss",
  "parallel-chord": "Parallel-chord",
  "pratt-pitched": "Pitched Pratt",
  "howe-pitched": "Pitched Howe",
  scissors: "Scissors",
  fink: "Fink",
  fan: "Fan",
  "mono-pitch": "Mono-pitch",
};

/** A generator shape by the name engineers use for it. */
export function shapeName(shape: GeneratorShape): string {
  return NAMES[shape];
}
