import { invalid } from "./errors";
import type { StiffnessSystem } from "./stiffness";

/** Smallest pivot, relative to its original diagonal entry, still trusted. */
const PIVOT_FLOOR = 1e-13;

/** The smallest pivot of an elimination relative to its diagonal entry: how many digits cancelled. */
export interface PivotStats {
  smallestPivotRatio: number;
}

const COLLAPSED_PIVOT = "the stiffness system is too ill-conditioned to solve reliably (extreme ratios of span, EI or spring stiffness); results would not be trustworthy";

/** Whether an error is the elimination's refusal of a collapsed pivot. */
export function isCollapsedPivot(error: unknown): boolean {
  return error instanceof Error && /too ill-conditioned to solve reliably/.test(error.message);
}

/**
 * Eliminates the symmetric positive definite band `a` (the upper band of `original`, copied,
 * stride hb + 1) in place, without pivoting (stable for such matrices), in O(n · b²): after it
 * `a` holds the upper factor, and each multiplier is a[k, i] / a[k, k] of the factored rows.
 * Throws when a pivot collapses, which means the stiffnesses are too disparate for the result
 * to be trusted.
 */
export function factorBanded(a: Float64Array, original: Float64Array, n: number, hb: number, stats?: PivotStats): void {
  const stride = hb + 1;
  for (let k = 0; k < n; k++) {
    const pivot = a[k * stride];
    const diagonal = original[k * stride];
    if (stats !== undefined) stats.smallestPivotRatio = Math.min(stats.smallestPivotRatio, pivot / diagonal);
    if (!(pivot > PIVOT_FLOOR * diagonal)) throw invalid(COLLAPSED_PIVOT);
    const last = Math.min(n - 1, k + hb);
    for (let i = k + 1; i <= last; i++) {
      const factor = a[k * stride + (i - k)] / pivot;
      if (factor === 0) continue;
      const row = i * stride - i;
      for (let j = i; j <= last; j++) a[row + j] -= factor * a[k * stride + (j - k)];
    }
  }
}

/**
 * Solves with a band factored by factorBanded, overwriting `x` (the right-hand side) with the
 * solution: the same operations, in the same order, as eliminating the right-hand side along
 * with the band, so a factored solve gives bit for bit what a fresh elimination gives.
 */
export function solveFactored(a: Float64Array, n: number, hb: number, x: Float64Array): void {
  const stride = hb + 1;
  for (let k = 0; k < n; k++) {
    const pivot = a[k * stride];
    const last = Math.min(n - 1, k + hb);
    for (let i = k + 1; i <= last; i++) {
      const factor = a[k * stride + (i - k)] / pivot;
      if (factor === 0) continue;
      x[i] -= factor * x[k];
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    let sum = x[k];
    const last = Math.min(n - 1, k + hb);
    for (let j = k + 1; j <= last; j++) sum -= a[k * stride + (j - k)] * x[j];
    x[k] = sum / a[k * stride];
  }
}

/**
 * Solves the symmetric positive definite banded system by Gaussian elimination without
 * pivoting (stable for such matrices) in O(n · b²). Throws when a pivot collapses, which
 * means the stiffnesses are too disparate for the result to be trusted.
 */
export function solveBanded(system: StiffnessSystem, stats?: PivotStats): Float64Array {
  const { size: n, halfBandwidth: hb } = system;
  const a = system.band.slice(0, n * (hb + 1));
  const x = system.rhs.slice(0, n);
  factorBanded(a, system.band, n, hb, stats);
  solveFactored(a, n, hb, x);
  return x;
}
