import type { TrussModel } from "../types";
import type { ModelUnits } from "./types";

/** The units every displayed quantity carries; the product defaults are kN and m. */
export function modelUnits(model: TrussModel): ModelUnits {
  const length = model.units?.length ?? "m";
  const force = model.units?.force ?? "kN";
  return { length, force, moment: `${force} ${length}` };
}
