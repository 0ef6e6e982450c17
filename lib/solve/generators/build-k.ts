/**
 * K truss with parallel chords and vertical end posts.
 *
 * Labels: bottom chord L0…Ln, top chord U0…Un, and Mi at mid-height of vertical
 * i, the number being the panel point. In each panel two half-diagonals run
 * from the mid-height joint of the vertical nearer the support to the top and
 * bottom of the next vertical toward midspan (M0U1 and M0L1, …), so with that
 * vertical each panel reads as a K. The midspan vertical Un/2Ln/2 is unbroken,
 * which is what keeps the truss statically determinate; the panel count is
 * therefore even.
 */
import { indexRange } from "./index-range";
import { panelX, type PanelGrid } from "./panel-x";
import type { ShapeLayout } from "./shape-layout";
import { TrussBuilder } from "./truss-builder";

/** Geometry of a K truss. */
export type KLayoutOptions = PanelGrid & { depth: number };

/** Lays out a K truss; supports are added by `generateTruss`. */
export function buildK(o: KLayoutOptions): ShapeLayout {
  const b = new TrussBuilder();
  const n = o.panels;
  const mid = n / 2;
  const bottom = indexRange(0, n).map((i) => b.joint(`L${i}`, panelX(o, i), 0));
  const top = indexRange(0, n).map((i) => b.joint(`U${i}`, panelX(o, i), o.depth));
  for (const i of indexRange(0, n)) if (i !== mid) b.joint(`M${i}`, panelX(o, i), o.depth / 2);
  b.chord("bottom", bottom);
  b.chord("top", top);
  for (let i = 0; i <= n; i++) {
    if (i === mid) b.member("web", `U${i}`, `L${i}`);
    else b.chord("web", [`U${i}`, `M${i}`, `L${i}`]);
    if (i >= n) continue;
    // Left half: the K's joint is on vertical i; right half: on vertical i + 1.
    const apex = i < mid ? `M${i}` : `M${i + 1}`;
    const far = i < mid ? i + 1 : i;
    b.member("web", apex, `U${far}`);
    b.member("web", apex, `L${far}`);
  }
  return { builder: b, top, bottom, loadedChord: "bottom" };
}
