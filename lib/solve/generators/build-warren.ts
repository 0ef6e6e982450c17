/**
 * Warren trusses with parallel chords, with or without verticals.
 *
 * Labels follow the bridge practice of numbering every panel point along the
 * span: the diagonals zig-zag L0U1, U1L2, L2U3, … so bottom chord joints carry
 * even numbers and top chord joints odd ones, and Li / Ui sit at
 * x = i × span / panels. Without verticals the bottom chord is L0, L2, …, Ln
 * and the top chord U1, U3, …, Un−1. With verticals every interior panel point
 * has both joints (L0…Ln, U1…Un−1) and a vertical UiLi. The panel count is
 * even so both ends finish on the bottom chord.
 */
import { indexRange } from "./index-range";
import { panelX, type PanelGrid } from "./panel-x";
import type { ShapeLayout } from "./shape-layout";
import { TrussBuilder } from "./truss-builder";

/** Geometry of a Warren truss. */
export type WarrenLayoutOptions = PanelGrid & { depth: number; verticals: boolean };

/** Lays out a Warren truss; supports are added by `generateTruss`. */
export function buildWarren(o: WarrenLayoutOptions): ShapeLayout {
  const b = new TrussBuilder();
  const n = o.panels;
  const hasBottom = (i: number) => o.verticals || i % 2 === 0;
  const hasTop = (i: number) => i > 0 && i < n && (o.verticals || i % 2 === 1);
  const bottom = indexRange(0, n)
    .filter(hasBottom)
    .map((i) => b.joint(`L${i}`, panelX(o, i), 0));
  const top = indexRange(0, n)
    .filter(hasTop)
    .map((i) => b.joint(`U${i}`, panelX(o, i), o.depth));
  b.chord("bottom", bottom);
  b.chord("top", top);
  for (let i = 0; i < n; i++) {
    if (o.verticals && i > 0) b.member("web", `U${i}`, `L${i}`);
    b.member("web", i % 2 === 0 ? `L${i}` : `U${i}`, i % 2 === 0 ? `U${i + 1}` : `L${i + 1}`);
  }
  return { builder: b, top, bottom, loadedChord: "bottom" };
}
