/**
 * The one place for tolerances and small numeric helpers, used by the solver and the tests.
 */

/** Relative tolerance for deciding that a computed quantity is zero against its scale. */
export const RELATIVE_ZERO = 1e-12;

/** Results smaller than this fraction of their quantity's scale are rounding noise, shown as 0. */
export const ROUNDING_NOISE = 1e-11;

/** Relative tolerance used when comparing positions along the member (fraction of its length). */
export const POSITION_TOLERANCE = 1e-12;

/** Relative tolerance of the handbook comparisons in the tests. */
export const HANDBOOK_TOLERANCE = 1e-9;

/** Equilibrium residual allowed, as a fraction of the load scale. */
export const EQUILIBRIUM_TOLERANCE = 1e-9;

/** True when a and b agree to `rel` of the larger magnitude (or of `scale` when given). */
export function relClose(a: number, b: number, rel: number, scale = 0): boolean {
  const size = Math.max(Math.abs(a), Math.abs(b), Math.abs(scale));
  return Math.abs(a - b) <= rel * size || a === b;
}

/** Relative difference |a-b| / max(|a|,|b|,scale), 0 when both are 0. */
export function relDiff(a: number, b: number, scale = 0): number {
  const size = Math.max(Math.abs(a), Math.abs(b), Math.abs(scale));
  return size === 0 ? 0 : Math.abs(a - b) / size;
}

/** Replaces values that are zero to rounding (|v| <= tol * scale) with exactly 0. */
export function cleanZero(value: number, scale: number, tol = ROUNDING_NOISE): number {
  return Math.abs(value) <= tol * scale ? 0 : value;
}

/** Largest of a list (or `start` when the list is empty), without spreading it into Math.max (bounded stack). */
export function maxOf(values: readonly number[], start = -Infinity): number {
  let m = start;
  for (const v of values) if (v > m) m = v;
  return m;
}

/** Smallest of a list (or `start` when the list is empty), without spreading it into Math.min. */
export function minOf(values: readonly number[], start = Infinity): number {
  let m = start;
  for (const v of values) if (v < m) m = v;
  return m;
}
