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

const GAUSS_NODES = [-0.8611363115940526, -0.3399810435848563, 0.3399810435848563, 0.8611363115940526];
const GAUSS_WEIGHTS = [0.3478548451374538, 0.6521451548625461, 0.6521451548625461, 0.3478548451374538];

/** Four-point Gauss–Legendre rule on [a, b]: exact for polynomials up to degree 7. */
export function gauss(f: (x: number) => number, a: number, b: number): number {
  const [mid, half] = [(a + b) / 2, (b - a) / 2];
  return half * GAUSS_NODES.reduce((sum, t, i) => sum + GAUSS_WEIGHTS[i] * f(mid + half * t), 0);
}
