import { invalid } from "./errors";
import type { StiffnessSystem } from "./stiffness";

/** Smallest pivot, relative to its original diagonal entry, still trusted. */
const PIVOT_FLOOR = 1e-13;

/** The smallest pivot of an elimination relative to its diagonal entry: how many digits cancelled. */
export interface PivotStats {
  smallestPivotRatio: number;
}

/** Whether an error is the elimination's refusal of a collapsed pivot. */
export function isCollapsedPivot(error: unknown): boolean {
  return error instanceof Error && /too ill-conditioned to solve reliably/.test(error.message);
}

/**
 * Solves the symmetric positive definite banded system by Gaussian elimination without
 * pivoting (stable for such matrices) in O(n · b²). Throws when a pivot collapses, which
 * means the stiffnesses are too disparate for the result to be trusted.
 */
export function solveBanded(system: StiffnessSystem, stats?: PivotStats): Float64Array {
  const { size: n, halfBandwidth: hb } = system;
  const stride = hb + 1;
  const a = Float64Array.from(system.band);
  const x = Float64Array.from(system.rhs);
  for (let k = 0; k < n; k++) {
    const pivot = a[k * stride];
    if (stats !== undefined) stats.smallestPivotRatio = Math.min(stats.smallestPivotRatio, pivot / system.band[k * stride]);
    if (!(pivot > PIVOT_FLOOR * system.band[k * stride])) {
      throw invalid(
        "the stiffness system is too ill-conditioned to solve reliably (extreme ratios of span, EI or spring stiffness); results would not be trustworthy",
      );
    }
    const last = Math.min(n - 1, k + hb);
    for (let i = k + 1; i <= last; i++) {
      const factor = a[k * stride + (i - k)] / pivot;
      if (factor === 0) continue;
      const row = i * stride - i;
      for (let j = i; j <= last; j++) a[row + j] -= factor * a[k * stride + (j - k)];
      x[i] -= factor * x[k];
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    let sum = x[k];
    const last = Math.min(n - 1, k + hb);
    for (let j = k + 1; j <= last; j++) sum -= a[k * stride + (j - k)] * x[j];
    x[k] = sum / a[k * stride];
  }
  return x;
}
