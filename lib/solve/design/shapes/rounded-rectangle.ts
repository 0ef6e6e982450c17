/** Area and centroidal second moments of a solid rectangle b × h with corner radius r. */
export type RoundedRectangle = { A: number; Ix: number; Iy: number };

/**
 * Closed form: the rectangle less four corner spandrels (an r × r square minus
 * a quarter disc), each moved to the centroidal axes by the parallel-axis
 * theorem. r = 0 gives bh³/12; b = h = 2r gives the disc πr⁴/4.
 */
export function roundedRectangle(b: number, h: number, r: number): RoundedRectangle {
  const A = b * h - (4 - Math.PI) * r ** 2;
  return { A, Ix: (b * h ** 3) / 12 - 4 * spandrelI(h, r), Iy: (h * b ** 3) / 12 - 4 * spandrelI(b, r) };
}

/** Second moment of one corner spandrel about the centroidal axis normal to the dimension `side` (h for Ix, b for Iy). */
function spandrelI(side: number, r: number): number {
  if (r === 0) return 0;
  const edge = side / 2;
  const square = r ** 4 / 12 + r ** 2 * (edge - r / 2) ** 2;
  // Quarter disc centred at distance c from the axis, its centroid e = 4r/3π further out:
  // I = I_centre − A e² + A (c + e)² = πr⁴/16 + A (c² + 2ce).
  const c = edge - r;
  const e = (4 * r) / (3 * Math.PI);
  const Aq = (Math.PI * r ** 2) / 4;
  const quarter = (Math.PI * r ** 4) / 16 + Aq * (c ** 2 + 2 * c * e);
  return square - quarter;
}
