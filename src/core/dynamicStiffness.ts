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

/** sum over k of (sign^k) u^k / (4k + offset)!, summed until the terms vanish. */
function series(u: number, sign: number, offset: number): number {
  let factorial = 1;
  for (let i = 2; i <= offset; i++) factorial *= i;
  let term = 1 / factorial;
  let sum = term;
  for (let k = 1; k < 60; k++) {
    const n = 4 * k + offset;
    term *= (sign * u) / ((n - 3) * (n - 2) * (n - 1) * n);
    sum += term;
    if (Math.abs(term) <= 1e-17 * Math.abs(sum)) break;
  }
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
    const D = 4 * series(u, -4, 4); // sum over k >= 1 of -(-4)^k u^(k-1) / (4k)!
    const F = series(u, -4, 1);
    const G = series(u, -4, 2);
    const H1 = series(u, 1, 1);
    const H2 = series(u, 1, 2);
    const Gg = series(u, -4, 3);
    const H3 = series(u, 1, 3);
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

/** The 4 x 4 dynamic stiffness matrix (row-major) for the DOFs (w1, theta1, w2, theta2). */
export function elementMatrix(ei: number, length: number, beta: number): number[] {
  const { a11, a12, a13, a14, a22, a24 } = dynamicEntries(beta);
  const L = length;
  const k3 = ei / (L * L * L);
  const k2 = k3 * L;
  const k1 = k2 * L;
  return [
    a11 * k3, a12 * k2, a13 * k3, a14 * k2,
    a12 * k2, a22 * k1, -a14 * k2, a24 * k1,
    a13 * k3, -a14 * k2, a11 * k3, -a12 * k2,
    a14 * k2, a24 * k1, -a12 * k2, a22 * k1,
  ];
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
  return [series(u, 1, 0), x * series(u, 1, 1), x * x * series(u, 1, 2), x ** 3 * series(u, 1, 3)];
}
