/**
 * An independent check of the exact vibration solver: a finite-element eigen solve of the
 * same member with cubic beam elements and the consistent mass matrix (mL/420 [156 22L 54 -13L
 * ...], the textbook Hermite-element mass matrix, from memory), assembled densely and solved
 * as K x = omega^2 M x by ml-matrix (Cholesky of M, then a symmetric eigen decomposition).
 * Its frequencies converge to the exact ones from above as the mesh is refined (error ~ h^4).
 */
import { CholeskyDecomposition, EigenvalueDecomposition, Matrix, inverse } from "ml-matrix";
import type { Support } from "../../../src/core";

export interface FeBeam {
  spans: number[];
  supports: Support[];
  EI: number[];
  /** Mass per length of each span. */
  mass: number[];
  /** Point masses: [x, mass] at span ends only. */
  points?: [number, number][];
}

/** The lowest `count` circular frequencies with `perSpan` elements in each span. */
export function feFrequencies(beam: FeBeam, perSpan: number, count: number): number[] {
  const nodeDofs: { w: number; left: number; right: number }[] = [];
  let next = 0;
  const nodeOfSpanEnd: number[] = [];
  const nodeX: number[] = [];
  let x = 0;
  beam.spans.forEach((span, s) => {
    const nodes = s === 0 ? [0] : [];
    for (let i = 1; i <= perSpan; i++) nodes.push(i);
    for (const i of nodes) {
      const end = i === 0 || i === perSpan;
      const support: Support = end ? beam.supports[i === 0 ? s : s + 1] : { kind: "free" };
      const w = support.kind === "pin" || support.kind === "fixed" ? -1 : next++;
      let left = -1;
      let right = -1;
      if (support.kind === "hinge") {
        left = next++;
        right = next++;
      } else if (support.kind !== "fixed") left = right = next++;
      nodeDofs.push({ w, left, right });
      nodeX.push(x + (span * i) / perSpan);
      if (end) nodeOfSpanEnd.push(nodeDofs.length - 1);
    }
    x += span;
  });
  const K = Matrix.zeros(next, next);
  const M = Matrix.zeros(next, next);
  let node = 0;
  beam.spans.forEach((span, s) => {
    const h = span / perSpan;
    const ei = beam.EI[s];
    const m = beam.mass[s];
    const k = [
      [12, 6 * h, -12, 6 * h],
      [6 * h, 4 * h * h, -6 * h, 2 * h * h],
      [-12, -6 * h, 12, -6 * h],
      [6 * h, 2 * h * h, -6 * h, 4 * h * h],
    ].map((row) => row.map((v) => (v * ei) / h ** 3));
    const mm = [
      [156, 22 * h, 54, -13 * h],
      [22 * h, 4 * h * h, 13 * h, -3 * h * h],
      [54, 13 * h, 156, -22 * h],
      [-13 * h, -3 * h * h, -22 * h, 4 * h * h],
    ].map((row) => row.map((v) => (v * m * h) / 420));
    for (let e = 0; e < perSpan; e++) {
      const a = nodeDofs[node + e];
      const b = nodeDofs[node + e + 1];
      const dofs = [a.w, a.right, b.w, b.left];
      for (let r = 0; r < 4; r++) {
        for (let c = 0; c < 4; c++) {
          if (dofs[r] < 0 || dofs[c] < 0) continue;
          K.set(dofs[r], dofs[c], K.get(dofs[r], dofs[c]) + k[r][c]);
          M.set(dofs[r], dofs[c], M.get(dofs[r], dofs[c]) + mm[r][c]);
        }
      }
    }
    node += perSpan;
  });
  beam.supports.forEach((support, i) => {
    const w = nodeDofs[nodeOfSpanEnd[i]].w;
    if (support.kind === "spring") K.set(w, w, K.get(w, w) + support.stiffness);
  });
  for (const [px, pm] of beam.points ?? []) {
    const i = nodeX.findIndex((nx) => Math.abs(nx - px) < 1e-9);
    const w = nodeDofs[i].w;
    M.set(w, w, M.get(w, w) + pm);
  }
  const L = new CholeskyDecomposition(M).lowerTriangularMatrix;
  const Li = inverse(L);
  const A = Li.mmul(K).mmul(Li.transpose());
  const sym = A.add(A.transpose()).div(2);
  const values = new EigenvalueDecomposition(sym, { assumeSymmetric: true }).realEigenvalues.slice().sort((p, q) => p - q);
  return values.slice(0, count).map((v) => Math.sqrt(v));
}
