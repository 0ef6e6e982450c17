import { texQty } from "../latex";

/**
 * A force component as magnitude and arrow (e.g. 15 kN ↑), which reads more
 * plainly on a free body than a signed component.
 */
export function directionArrow(value: number, axis: "x" | "y", unit: string): string {
  const arrow = axis === "x" ? (value >= 0 ? "\\rightarrow" : "\\leftarrow") : value >= 0 ? "\\uparrow" : "\\downarrow";
  return `${texQty(Math.abs(value), unit)}\\,${arrow}`;
}
