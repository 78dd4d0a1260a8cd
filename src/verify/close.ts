/**
 * Closeness, using only the tolerances and helpers of src/core/tolerance.ts: `a` and `b` agree
 * when |a - b| <= rel · max(|a|, |b|, scale). The scale keeps values near zero from demanding
 * impossible relative accuracy (use the member's own scale, see scalesOf in members.ts).
 */
import { relDiff } from "../core/tolerance";

export function isClose(actual: number, expected: number, rel: number, scale = 0): boolean {
  return Number.isFinite(actual) && relDiff(actual, expected, scale) <= rel;
}

/** Throws a message naming what was compared when `actual` is not close to `expected`. */
export function expectClose(label: string, actual: number, expected: number, rel: number, scale = 0): void {
  if (!isClose(actual, expected, rel, scale)) {
    const diff = relDiff(actual, expected, scale);
    throw new Error(`${label}: got ${actual}, expected ${expected} (relative difference ${diff.toExponential(2)} > ${rel})`);
  }
}
