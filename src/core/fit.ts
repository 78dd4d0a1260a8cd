/**
 * Interpolating polynomial through (u_j, f_j), as coefficients in powers of u. Exact (to
 * rounding) when f is a polynomial of degree below the number of points; used on Chebyshev
 * points in [-1, 1], where the small Vandermonde system is well conditioned.
 */
export function fitPolynomial(us: number[], fs: number[]): number[] {
  const n = us.length;
  const a = us.map((u, i) => {
    const row: number[] = [];
    let power = 1;
    for (let j = 0; j < n; j++) {
      row.push(power);
      power *= u;
    }
    row.push(fs[i]);
    return row;
  });
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(a[r][col]) > Math.abs(a[pivot][col])) pivot = r;
    [a[col], a[pivot]] = [a[pivot], a[col]];
    for (let r = col + 1; r < n; r++) {
      const factor = a[r][col] / a[col][col];
      for (let c = col; c <= n; c++) a[r][c] -= factor * a[col][c];
    }
  }
  const coefficients = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let sum = a[r][n];
    for (let c = r + 1; c < n; c++) sum -= a[r][c] * coefficients[c];
    coefficients[r] = sum / a[r][r];
  }
  return coefficients;
}

/** n Chebyshev points of the first kind in (-1, 1). */
export function chebyshevPoints(n: number): number[] {
  return Array.from({ length: n }, (_, j) => Math.cos(((2 * j + 1) * Math.PI) / (2 * n)));
}
