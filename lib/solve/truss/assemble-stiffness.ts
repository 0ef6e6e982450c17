import { addToBand, createBandMatrix, type BandMatrix } from "../sparse/band-matrix";
import type { TrussIndex } from "./index-truss";
import type { MemberGeometry } from "./member-geometry";
import type { DofNumbering } from "./number-dofs";

/**
 * The stiffness matrix on the free components: each member adds
 * k·v·vᵀ, where v maps its end displacements to its elongation. In x–y
 * components this is the familiar (AE/L)[c², cs; cs, s²] block pattern; at a
 * roller v is taken in the roller's own basis. `axial[e]` is k for member e
 * (AE/L, or 1 for a stiffness-free check).
 */
export function assembleStiffness(index: TrussIndex, geometry: MemberGeometry, dofs: DofNumbering, axial: Float64Array): BandMatrix {
  const K = createBandMatrix(dofs.n, dofs.bandwidth);
  const eq = new Int32Array(4);
  const v = new Float64Array(4);
  for (let e = 0; e < axial.length; e++) {
    memberVector(index, geometry, dofs, e, eq, v);
    const k = axial[e];
    for (let p = 0; p < 4; p++) {
      if (eq[p] < 0) continue;
      for (let q = 0; q <= p; q++) {
        if (eq[q] < 0) continue;
        // Band storage keeps one value for (p, q) and (q, p), so each pair is added once.
        addToBand(K, eq[p], eq[q], k * v[p] * v[q]);
      }
    }
  }
  return K;
}

/**
 * Equation numbers and elongation coefficients of member e, ordered
 * (start e1, start e2, end e1, end e2): elongation = Σ v[p]·u[eq[p]].
 */
export function memberVector(index: TrussIndex, geometry: MemberGeometry, dofs: DofNumbering, e: number, eq: Int32Array, v: Float64Array): void {
  const a = index.start[e];
  const b = index.end[e];
  const cx = geometry.cx[e];
  const cy = geometry.cy[e];
  eq[0] = dofs.dof1[a];
  eq[1] = dofs.dof2[a];
  eq[2] = dofs.dof1[b];
  eq[3] = dofs.dof2[b];
  v[0] = -(cx * dofs.e1x[a] + cy * dofs.e1y[a]);
  v[1] = -(cx * dofs.e2x[a] + cy * dofs.e2y[a]);
  v[2] = cx * dofs.e1x[b] + cy * dofs.e1y[b];
  v[3] = cx * dofs.e2x[b] + cy * dofs.e2y[b];
}
