import { chooseDisplayUnit } from "./choose-display-unit";
import { dimensionName } from "./engineering-units";
import type { UnitSystem } from "./formula-types";
import { isDimensionless, type Measure } from "./measure";

/** A value's kind for messages: "a force (kN)", "a plain number", "a quantity in kg*m^2/s^3". */
export function describeMeasure(m: Measure, system: UnitSystem): string {
  if (isDimensionless(m.dims)) return "a plain number";
  const shown = chooseDisplayUnit({ si: m.si, dims: m.dims }, system);
  const unit = shown.ok ? shown.unit : "";
  const kind = dimensionName(m.dims);
  return kind ? `${/^[aeiou]/.test(kind) ? "an" : "a"} ${kind} (${unit})` : `a quantity in ${unit}`;
}
