/** A rectangle x0 ≤ x ≤ x1, y0 ≤ y ≤ y1 of a composite section. */
export type Rect = { x0: number; x1: number; y0: number; y1: number };

/** Area, centroid and second moments about the centroid of non-overlapping rectangles. */
export type RectangleSum = { A: number; xBar: number; yBar: number; Ix: number; Iy: number; Ixy: number };

/** Sums rectangles by the parallel-axis theorem (closed form: I = bh³/12 + A·e² per part). */
export function rectangleSum(rects: Rect[]): RectangleSum {
  const parts = rects.map((r) => {
    const b = r.x1 - r.x0;
    const h = r.y1 - r.y0;
    return { A: b * h, x: (r.x0 + r.x1) / 2, y: (r.y0 + r.y1) / 2, Ix0: (b * h ** 3) / 12, Iy0: (h * b ** 3) / 12 };
  });
  const A = parts.reduce((s, p) => s + p.A, 0);
  const xBar = parts.reduce((s, p) => s + p.A * p.x, 0) / A;
  const yBar = parts.reduce((s, p) => s + p.A * p.y, 0) / A;
  let Ix = 0;
  let Iy = 0;
  let Ixy = 0;
  for (const p of parts) {
    Ix += p.Ix0 + p.A * (p.y - yBar) ** 2;
    Iy += p.Iy0 + p.A * (p.x - xBar) ** 2;
    Ixy += p.A * (p.x - xBar) * (p.y - yBar);
  }
  return { A, xBar, yBar, Ix, Iy, Ixy };
}
