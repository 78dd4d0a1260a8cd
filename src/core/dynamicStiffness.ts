/**
 * The exact dynamic stiffness of a uniform Euler-Bernoulli beam element in harmonic motion
 * (frequency omega, mass m per length, flexural stiffness EI, length L), with
 * lambda^4 = omega^2 m / EI and beta = lambda L. End DOFs (w1, theta1, w2, theta2) with
 * theta = dw/dx; the matrix reduces to the static cubic element at beta = 0.
 *
 * Numerics: for beta < SERIES_LIMIT every entry is a ratio of power series in beta^4 (no
 * cancellation near 0); above it the closed forms are divided through by cosh(beta), so
 * they stay finite for any beta (tanh and sech never overflow).
 */

/** Below this beta the element uses the power series; above, the scaled closed forms. */
export const SERIES_LIMIT = 2;

/** The six distinct entries of the dimensionless matrix (see elementMatrix). */
export interface DynamicEntries {
  a11: number;
  a12: number;
  a13: number;
  a14: number;
  a22: number;
  a24: number;
}

/** Terms kept in the power series: for u = beta^4 <= 16 the 12th term is below 1e-19 of the first. */
const TERMS = 12;

/** Coefficients sign^k / (4k + offset)! of the series in u = beta^4, k = 0 .. TERMS - 1. */
function coefficientsOf(sign: number, offset: number): Float64Array {
  const c = new Float64Array(TERMS);
  let factorial = 1;
  for (let i = 2; i <= offset; i++) factorial *= i;
  c[0] = 1 / factorial;
  for (let k = 1; k < TERMS; k++) {
    const n = 4 * k + offset;
    c[k] = (c[k - 1] * sign) / ((n - 3) * (n - 2) * (n - 1) * n);
  }
  return c;
}

const SERIES = {
  d: coefficientsOf(-4, 4),
  f: coefficientsOf(-4, 1),
  g: coefficientsOf(-4, 2),
  gg: coefficientsOf(-4, 3),
  h1: coefficientsOf(1, 1),
  h2: coefficientsOf(1, 2),
  h3: coefficientsOf(1, 3),
  k0: coefficientsOf(1, 0),
};

/** sum over k of c[k] u^k (Horner). */
function series(c: Float64Array, u: number): number {
  let sum = 0;
  for (let k = TERMS - 1; k >= 0; k--) sum = sum * u + c[k];
  return sum;
}

/**
 * Dimensionless entries: the element matrix is
 *   [ a11      a12 L    a13     a14 L  ]
 *   [ a12 L    a22 L^2 -a14 L   a24 L^2]  x EI / L^3
 *   [ a13     -a14 L    a11    -a12 L  ]
 *   [ a14 L    a24 L^2 -a12 L   a22 L^2]
 * (static values 12, 6, -12, 6, 4, 2 at beta = 0).
 */
export function dynamicEntries(beta: number): DynamicEntries {
  if (beta < SERIES_LIMIT) {
    const u = beta ** 4;
    // delta = 1 - cos cosh = beta^4 D; the numerators likewise carry their powers of beta.
    const D = 4 * series(SERIES.d, u); // sum over k >= 1 of -(-4)^k u^(k-1) / (4k)!
    const F = series(SERIES.f, u);
    const G = series(SERIES.g, u);
    const H1 = series(SERIES.h1, u);
    const H2 = series(SERIES.h2, u);
    const Gg = series(SERIES.gg, u);
    const H3 = series(SERIES.h3, u);
    return { a11: (2 * F) / D, a12: (2 * G) / D, a13: (-2 * H1) / D, a14: (2 * H2) / D, a22: (4 * Gg) / D, a24: (2 * H3) / D };
  }
  const c = Math.cos(beta);
  const s = Math.sin(beta);
  const t = Math.tanh(beta);
  const h = 1 / Math.cosh(beta);
  const den = h - c;
  const b2 = beta * beta;
  const b3 = b2 * beta;
  return {
    a11: (b3 * (c * t + s)) / den,
    a12: (b2 * s * t) / den,
    a13: (-b3 * (s * h + t)) / den,
    a14: (b2 * (1 - c * h)) / den,
    a22: (beta * (s - c * t)) / den,
    a24: (beta * (t - s * h)) / den,
  };
}

const MATRIX = new Float64Array(16);

/**
 * The 4 x 4 dynamic stiffness matrix (row-major) for the DOFs (w1, theta1, w2, theta2). The
 * array is reused by the next call: copy it to keep it.
 */
export function elementMatrix(ei: number, length: number, beta: number): Float64Array {
  const { a11, a12, a13, a14, a22, a24 } = dynamicEntries(beta);
  const L = length;
  const k3 = ei / (L * L * L);
  const k2 = k3 * L;
  const k1 = k2 * L;
  const m = MATRIX;
  m[0] = a11 * k3; m[1] = a12 * k2; m[2] = a13 * k3; m[3] = a14 * k2;
  m[4] = a12 * k2; m[5] = a22 * k1; m[6] = -a14 * k2; m[7] = a24 * k1;
  m[8] = a13 * k3; m[9] = -a14 * k2; m[10] = a11 * k3; m[11] = -a12 * k2;
  m[12] = a14 * k2; m[13] = a24 * k1; m[14] = -a12 * k2; m[15] = a22 * k1;
  return m;
}

/**
 * How many natural frequencies of the element with both ends clamped lie below the trial
 * frequency (the J0 term of the Wittrick-Williams count): i - (1 - (-1)^i sgn(1 - cos cosh))/2
 * with i the integer part of beta / pi.
 */
export function clampedCount(beta: number): number {
  if (beta < SERIES_LIMIT) return 0;
  const i = Math.floor(beta / Math.PI);
  const sign = 1 / Math.cosh(beta) - Math.cos(beta) >= 0 ? 1 : -1;
  return i - (1 - (i % 2 === 0 ? 1 : -1) * sign) / 2;
}

/**
 * The Krylov functions of the element scaled to x: k1 = sum lambda^4k x^4k/(4k)!,
 * k2 = sum lambda^4k x^(4k+1)/(4k+1)!, k3 (4k+2), k4 (4k+3). w(x) = w0 k1 + theta0 k2 +
 * w''(0) k3 + w'''(0) k4 solves EI w'''' = m omega^2 w; k1' = lambda^4 k4, k2' = k1, k3' = k2,
 * k4' = k3. Every term is positive: no cancellation, for lambda x up to a few units.
 */
export function krylov(lambda4: number, x: number): [number, number, number, number] {
  const u = lambda4 * x ** 4;
  return [series(SERIES.k0, u), x * series(SERIES.h1, u), x * x * series(SERIES.h2, u), x ** 3 * series(SERIES.h3, u)];
}
