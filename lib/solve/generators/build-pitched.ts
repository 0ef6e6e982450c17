/**
 * Gable trusses with a vertical at every panel point: pitched Pratt, pitched
 * Howe, and scissors (the same web with the bottom chord pitched too).
 *
 * Labels: bottom chord L0…Ln, top chord U1…Un−1, the number being the panel
 * point, so Li and Ui are plumb; the heels L0 and Ln are shared by both chords,
 * so the top chord reads L0, U1, …, Un−1, Ln and its end members are L0U1 and
 * Un−1Ln. Verticals UiLi. The end panels are plain triangles; every other panel
 * has one diagonal, falling toward midspan in the Pratt and the scissors (U1L2,
 * …), rising toward it in the Howe (L1U2, …). The panel count is even so the
 * apex Un/2 sits over midspan.
 */
import { gableHeight } from "./gable-height";
import { indexRange } from "./index-range";
import { panelX, type PanelGrid } from "./panel-x";
import type { ShapeLayout } from "./shape-layout";
import { TrussBuilder } from "./truss-builder";

/** Geometry of a gable truss; `bottomRise` 0 gives a flat bottom chord. */
export type PitchedLayoutOptions = PanelGrid & { web: "pratt" | "howe"; rise: number; bottomRise: number };

/** Lays out a pitched Pratt, Howe or scissors truss; supports are added by `generateTruss`. */
export function buildPitched(o: PitchedLayoutOptions): ShapeLayout {
  const b = new TrussBuilder();
  const n = o.panels;
  const bottom = indexRange(0, n).map((i) => b.joint(`L${i}`, panelX(o, i), gableHeight(o.bottomRise, i, n)));
  const inner = indexRange(1, n - 1).map((i) => b.joint(`U${i}`, panelX(o, i), gableHeight(o.rise, i, n)));
  const top = [bottom[0], ...inner, bottom[n]];
  b.chord("bottom", bottom);
  b.chord("top", top);
  for (let i = 1; i < n; i++) {
    b.member("web", `U${i}`, `L${i}`);
    if (i === n - 1) continue;
    const falling = (o.web === "pratt") === (i < n / 2);
    b.member("web", falling ? `U${i}` : `L${i}`, falling ? `L${i + 1}` : `U${i + 1}`);
  }
  return { builder: b, top, bottom, loadedChord: "top" };
}
