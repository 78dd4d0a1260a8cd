/**
 * Composite Simpson quadrature split at given breakpoints. Within each smooth stretch the
 * integrands of the tests are polynomials of degree <= 3, which Simpson's rule integrates
 * exactly, so the only error is rounding.
 */
export function integrate(f: (x: number) => number, a: number, b: number, breaks: number[] = [], panels = 16): number {
  if (b <= a) return 0;
  const cuts = [a, ...breaks.filter((x) => x > a && x < b).sort((p, q) => p - q), b];
  let total = 0;
  for (let i = 0; i + 1 < cuts.length; i++) {
    const [lo, hi] = [cuts[i], cuts[i + 1]];
    const h = (hi - lo) / (2 * panels);
    let sum = f(lo) + f(hi);
    for (let k = 1; k < 2 * panels; k++) sum += (k % 2 ? 4 : 2) * f(lo + k * h);
    total += (sum * h) / 3;
  }
  return total;
}
