/**
 * Fan truss: in each half, webs fan out from one bottom chord joint to every
 * top chord panel point of that half.
 *
 * Each chord is numbered on its own, left to right, as for the Fink. Top chord
 * U1…Un−1 at the panel points of the pitched top chord, apex Un/2, heels shared;
 * bottom chord L0, L1, L2, L3 with L1 and L2 at the third points of the span
 * (common practice). L1 is joined to U1…Un/2 and L2 to Un/2…Un−1; with 4
 * panels the fan and the Fink coincide.
 */
import { gableHeight } from "./gable-height";
import { indexRange } from "./index-range";
import { panelX, type PanelGrid } from "./panel-x";
import type { ShapeLayout } from "./shape-layout";
import { TrussBuilder } from "./truss-builder";

/** Geometry of a fan truss: `panels` counts top chord panels. */
export type FanLayoutOptions = PanelGrid & { rise: number };

/** Lays out a fan truss; supports are added by `generateTruss`. */
export function buildFan(o: FanLayoutOptions): ShapeLayout {
  const b = new TrussBuilder();
  const n = o.panels;
  const thirds = { span: o.span, panels: 3 };
  const bottom = indexRange(0, 3).map((k) => b.joint(`L${k}`, panelX(thirds, k), 0));
  const inner = indexRange(1, n - 1).map((i) => b.joint(`U${i}`, panelX(o, i), gableHeight(o.rise, i, n)));
  const top = [bottom[0], ...inner, bottom[3]];
  b.chord("bottom", bottom);
  b.chord("top", top);
  for (let i = 1; i <= n / 2; i++) b.member("web", "L1", `U${i}`);
  for (let i = n / 2; i <= n - 1; i++) b.member("web", "L2", `U${i}`);
  return { builder: b, top, bottom, loadedChord: "top" };
}
