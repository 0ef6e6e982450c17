import { createBandMatrix, type BandMatrix } from "../sparse/band-matrix";
import type { TrussIndex } from "./index-truss";
import type { MemberGeometry } from "./member-geometry";
import type { DofNumbering } from "./number-dofs";

/**
 * For member e, `eq[4e … 4e+3]` are the equations of (start e1, start e2,
 * end e1, end e2), −1 where restrained, and `v[4e … 4e+3]` the coefficients
 * with which they make its elongation: δ = Σ v·u.
 */
export type MemberCoefficients = { eq: Int32Array; v: Float64Array };

/** Elongation coefficients of every member, each end in its joint's own basis (the roller's at a roller). */
export function memberCoefficients(index: TrussIndex, geometry: MemberGeometry, dofs: DofNumbering): MemberCoefficients {
  const m = geometry.length.length;
  const eq = new Int32Array(4 * m);
  const v = new Float64Array(4 * m);
  for (let e = 0; e < m; e++) {
    const a = index.start[e];
    const b = index.end[e];
    const cx = geometry.cx[e];
    const cy = geometry.cy[e];
    const o = 4 * e;
    eq[o] = dofs.dof1[a];
    eq[o + 1] = dofs.dof2[a];
    eq[o + 2] = dofs.dof1[b];
    eq[o + 3] = dofs.dof2[b];
    v[o] = -(cx * dofs.e1x[a] + cy * dofs.e1y[a]);
    v[o + 1] = -(cx * dofs.e2x[a] + cy * dofs.e2y[a]);
    v[o + 2] = cx * dofs.e1x[b] + cy * dofs.e1y[b];
    v[o + 3] = cx * dofs.e2x[b] + cy * dofs.e2y[b];
  }
  return { eq, v };
}

/**
 * The stiffness matrix on the free components: each member adds k·v·vᵀ. In
 * x–y components this is the familiar (AE/L)[c², cs; cs, s²] block pattern;
 * at a roller v is taken in the roller's basis, so its restraint is exact.
 * `axial[e]` is k for member e (AE/L, or 1 for the geometric check).
 */
export function assembleStiffness(coefficients: MemberCoefficients, dofs: DofNumbering, axial: Float64Array): BandMatrix {
  const K = createBandMatrix(dofs.n, dofs.bandwidth);
  const { eq, v } = coefficients;
  const { data, b } = K;
  const w = b + 1;
  for (let e = 0; e < axial.length; e++) {
    const k = axial[e];
    const o = 4 * e;
    for (let p = o; p < o + 4; p++) {
      const ip = eq[p];
      if (ip < 0) continue;
      for (let q = o; q <= p; q++) {
        const iq = eq[q];
        if (iq < 0) continue;
        // Band storage keeps one value for (p, q) and (q, p), so each pair is added once, in the lower triangle.
        const row = ip > iq ? ip : iq;
        data[row * w + (ip + iq - row) - row + b] += k * v[p] * v[q];
      }
    }
  }
  return K;
}
