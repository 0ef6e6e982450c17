/**
 * Pratt and Howe trusses with parallel chords.
 *
 * Labels: bottom chord L0…Ln and top chord U0…Un (vertical end posts) or
 * U1…Un−1 (inclined end posts), the number being the panel point, so Li and Ui
 * are plumb. Verticals UiLi; one diagonal per panel. In the Pratt the
 * diagonals fall toward midspan (U0L1, U1L2, … then Ln−1Un…), so under gravity
 * they are in tension; the Howe mirrors them (L0U1, …), putting them in
 * compression. The panel count is even so the pattern turns at a midspan joint.
 */
import type { EndPosts } from "./generate-truss-options";
import { indexRange } from "./index-range";
import { panelX, type PanelGrid } from "./panel-x";
import type { ShapeLayout } from "./shape-layout";
import { TrussBuilder } from "./truss-builder";

/** Geometry of a parallel-chord Pratt or Howe. */
export type PrattHoweLayoutOptions = PanelGrid & { web: "pratt" | "howe"; depth: number; ends: EndPosts };

/** Lays out a parallel-chord Pratt or Howe; supports are added by `generateTruss`. */
export function buildPrattHowe(o: PrattHoweLayoutOptions): ShapeLayout {
  const b = new TrussBuilder();
  const n = o.panels;
  const first = o.ends === "vertical" ? 0 : 1;
  const bottom = indexRange(0, n).map((i) => b.joint(`L${i}`, panelX(o, i), 0));
  const top = indexRange(first, n - first).map((i) => b.joint(`U${i}`, panelX(o, i), o.depth));
  b.chord("bottom", bottom);
  b.chord("top", top);
  for (let i = 0; i <= n; i++) {
    if (i >= first && i <= n - first) b.member("web", `U${i}`, `L${i}`);
    if (i < n) b.member("web", ...diagonal(o.web, i, n, first));
  }
  return { builder: b, top, bottom, loadedChord: "bottom" };
}

/** The diagonal of panel i (between panel points i and i + 1). */
function diagonal(web: "pratt" | "howe", i: number, n: number, first: number): [string, string] {
  // With inclined end posts the end panels' diagonals are the end posts themselves.
  if (first === 1 && i === 0) return ["L0", "U1"];
  if (first === 1 && i === n - 1) return [`U${n - 1}`, `L${n}`];
  const leftHalf = i < n / 2;
  const falling = web === "pratt" ? leftHalf : !leftHalf;
  return falling ? [`U${i}`, `L${i + 1}`] : [`L${i}`, `U${i + 1}`];
}
