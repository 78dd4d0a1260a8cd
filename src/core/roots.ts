import { derivative, evaluatePolynomial } from "./polynomial";

function trimmed(c: number[]): number[] {
  let n = c.length;
  while (n > 0 && c[n - 1] === 0) n--;
  return c.slice(0, n);
}

function bisect(c: number[], lo: number, hi: number, flo: number): number {
  let a = lo;
  let b = hi;
  let fa = flo;
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (a + b);
    if (mid <= a || mid >= b) break;
    const fm = evaluatePolynomial(c, mid);
    if (fm === 0) return mid;
    if (fa < 0 === fm < 0) {
      a = mid;
      fa = fm;
    } else b = mid;
  }
  return 0.5 * (a + b);
}

function quadraticRoots(c: number[], lo: number, hi: number): number[] {
  const [r, q, p] = c;
  const disc = q * q - 4 * p * r;
  if (disc < 0) return [];
  const root = Math.sqrt(disc);
  const t = -0.5 * (q + (q >= 0 ? root : -root));
  const roots: number[] = [];
  if (t !== 0) roots.push(r / t);
  roots.push(t / p);
  return roots.filter((s) => s > lo && s < hi).sort((a, b) => a - b);
}

/**
 * Real roots of the polynomial c[0] + c[1] s + ... strictly inside (lo, hi), ascending.
 * Degrees 1 and 2 in closed form; higher degrees by isolating each root between the roots
 * of the derivative (where the polynomial is monotonic) and bisecting to full precision.
 */
export function rootsBetween(coefficients: number[], lo: number, hi: number): number[] {
  const c = trimmed(coefficients);
  if (c.length <= 1) return [];
  if (c.length === 2) {
    const s = -c[0] / c[1];
    return s > lo && s < hi ? [s] : [];
  }
  if (c.length === 3) return quadraticRoots(c, lo, hi);
  const turning = rootsBetween(derivative(c), lo, hi);
  const edges = [lo, ...turning, hi];
  const roots: number[] = [];
  for (let i = 0; i + 1 < edges.length; i++) {
    const a = edges[i];
    const b = edges[i + 1];
    const fa = evaluatePolynomial(c, a);
    const fb = evaluatePolynomial(c, b);
    if (fa === 0 && i > 0) roots.push(a);
    else if (fa !== 0 && fb !== 0 && fa < 0 !== fb < 0) roots.push(bisect(c, a, b, fa));
  }
  return roots;
}
