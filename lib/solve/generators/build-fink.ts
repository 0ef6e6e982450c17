/**
 * Fink (W) truss and its multi-W generalisation.
 *
 * Each chord is numbered on its own, left to right, as is usual for roof
 * trusses whose bottom chord is not divided at the top chord panel points.
 * Top chord U1…Un−1 at the panel points of the pitched top chord (heels L0 and
 * the last L shared); bottom chord L0…Ln−1, the span divided into n − 1 equal
 * bays, so each interior bottom joint Lk lies between Uk and Uk+1. The webs
 * zig-zag U1L1, L1U2, U2L2, …, Ln−2Un−1: with 4 panels that is the classic Fink
 * W (bottom joints at the third points), with 6 the double W.
 */
import { gableHeight } from "./gable-height";
import { indexRange } from "./index-range";
import { panelX, type PanelGrid } from "./panel-x";
import type { ShapeLayout } from "./shape-layout";
import { TrussBuilder } from "./truss-builder";

/** Geometry of a Fink truss: `panels` counts top chord panels. */
export type FinkLayoutOptions = PanelGrid & { rise: number };

/** Lays out a Fink truss; supports are added by `generateTruss`. */
export function buildFink(o: FinkLayoutOptions): ShapeLayout {
  const b = new TrussBuilder();
  const n = o.panels;
  const bays = { span: o.span, panels: n - 1 };
  const bottom = indexRange(0, n - 1).map((k) => b.joint(`L${k}`, panelX(bays, k), 0));
  const inner = indexRange(1, n - 1).map((i) => b.joint(`U${i}`, panelX(o, i), gableHeight(o.rise, i, n)));
  const top = [bottom[0], ...inner, bottom[n - 1]];
  b.chord("bottom", bottom);
  b.chord("top", top);
  for (let k = 1; k <= n - 2; k++) {
    b.member("web", `U${k}`, `L${k}`);
    b.member("web", `L${k}`, `U${k + 1}`);
  }
  return { builder: b, top, bottom, loadedChord: "top" };
}
