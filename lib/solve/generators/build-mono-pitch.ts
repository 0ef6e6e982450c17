/**
 * Mono-pitch truss: flat bottom chord, top chord rising from the left heel to a
 * vertical end post over the right support.
 *
 * Labels: bottom chord L0…Ln, top chord U1…Un, the number being the panel
 * point (Li and Ui plumb); L0 is the heel shared by both chords, so the top
 * chord reads L0, U1, …, Un. Verticals UiLi including the end post UnLn; the
 * heel panel is a triangle and every other panel has a diagonal falling from
 * its lower top joint toward the high end (U1L2, U2L3, …).
 */
import { indexRange } from "./index-range";
import { panelX, type PanelGrid } from "./panel-x";
import type { ShapeLayout } from "./shape-layout";
import { TrussBuilder } from "./truss-builder";

/** Geometry of a mono-pitch truss; `rise` is the height of the end post. */
export type MonoPitchLayoutOptions = PanelGrid & { rise: number };

/** Lays out a mono-pitch truss; supports are added by `generateTruss`. */
export function buildMonoPitch(o: MonoPitchLayoutOptions): ShapeLayout {
  const b = new TrussBuilder();
  const n = o.panels;
  const bottom = indexRange(0, n).map((i) => b.joint(`L${i}`, panelX(o, i), 0));
  const top = [bottom[0], ...indexRange(1, n).map((i) => b.joint(`U${i}`, panelX(o, i), (o.rise * i) / n))];
  b.chord("bottom", bottom);
  b.chord("top", top);
  for (let i = 1; i <= n; i++) {
    b.member("web", `U${i}`, `L${i}`);
    if (i < n) b.member("web", `U${i}`, `L${i + 1}`);
  }
  return { builder: b, top, bottom, loadedChord: "top" };
}
