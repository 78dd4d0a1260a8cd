/**
 * The lean yardstick of the per-row benchmark: a continuous beam on pins, constant EI, each
 * span carrying one full-span UDL and one point load, solved by the three-moment equations
 * (Clapeyron; load terms for a UDL w L^3 / 4 and for a point load P a (L^2 - a^2) / L at the
 * support a from the load, e.g. Timoshenko & Young, Theory of Structures, from memory) with a
 * tridiagonal (Thomas) solve, and the exact largest sagging moment found where the shear
 * crosses zero (inside a stretch, or at the point load where it jumps through zero) and at the
 * span ends. Allocation-free after the first call: scratch arrays are reused.
 */
export interface YardstickBeam {
  spans: number[];
  /** Full-span UDL on each span (down +). */
  udl: number[];
  /** Point load on each span (down +) and its distance from the span's left support. */
  point: number[];
  at: number[];
}

let sub = new Float64Array(0);
let diag = new Float64Array(0);
let sup = new Float64Array(0);
let rhs = new Float64Array(0);
let support = new Float64Array(0);

function grow(n: number): void {
  if (sub.length >= n) return;
  sub = new Float64Array(n);
  diag = new Float64Array(n);
  sup = new Float64Array(n);
  rhs = new Float64Array(n);
  support = new Float64Array(n + 2);
}

/** Bending moment at x from a span's left support (sagging +). */
function momentAt(ml: number, v0: number, w: number, p: number, a: number, x: number): number {
  return ml + v0 * x - (w * x * x) / 2 - (x > a ? p * (x - a) : 0);
}

/** Largest sagging moment over the member and where it occurs (x from the left end). */
export function yardstickMaxMoment(beam: YardstickBeam, out: { max: number; x: number }): void {
  const { spans, udl, point, at } = beam;
  const n = spans.length;
  const m = n - 1;
  grow(Math.max(m, 1));
  for (let i = 0; i < m; i++) {
    const l1 = spans[i];
    const l2 = spans[i + 1];
    const a1 = at[i];
    const b2 = l2 - at[i + 1];
    sub[i] = l1;
    diag[i] = 2 * (l1 + l2);
    sup[i] = l2;
    const left = (udl[i] * l1 * l1 * l1) / 4 + (point[i] * a1 * (l1 * l1 - a1 * a1)) / l1;
    const right = (udl[i + 1] * l2 * l2 * l2) / 4 + (point[i + 1] * b2 * (l2 * l2 - b2 * b2)) / l2;
    rhs[i] = -(left + right);
  }
  // Thomas algorithm (diagonally dominant: 2(l1 + l2) > l1 + l2).
  for (let i = 1; i < m; i++) {
    const f = sub[i] / diag[i - 1];
    diag[i] -= f * sup[i - 1];
    rhs[i] -= f * rhs[i - 1];
  }
  support[0] = 0;
  support[n] = 0;
  for (let i = m - 1; i >= 0; i--) support[i + 1] = (rhs[i] - (i + 1 < m ? sup[i] * support[i + 2] : 0)) / diag[i];
  let max = -Infinity;
  let xMax = 0;
  let x0 = 0;
  for (let e = 0; e < n; e++) {
    const l = spans[e];
    const w = udl[e];
    const p = point[e];
    const a = at[e];
    const ml = support[e];
    const mr = support[e + 1];
    const v0 = (w * l) / 2 + (p * (l - a)) / l + (mr - ml) / l;
    // Candidates: both span ends, the point load, and the shear's zero in each stretch.
    let x = 0;
    let value = ml;
    if (value > max) {
      max = value;
      xMax = x0;
    }
    value = momentAt(ml, v0, w, p, a, l);
    if (value > max) {
      max = value;
      xMax = x0 + l;
    }
    value = momentAt(ml, v0, w, p, a, a);
    if (value > max) {
      max = value;
      xMax = x0 + a;
    }
    if (w > 0) {
      x = v0 / w;
      if (x > 0 && x < a) {
        value = momentAt(ml, v0, w, p, a, x);
        if (value > max) {
          max = value;
          xMax = x0 + x;
        }
      }
      x = (v0 - p) / w;
      if (x > a && x < l) {
        value = momentAt(ml, v0, w, p, a, x);
        if (value > max) {
          max = value;
          xMax = x0 + x;
        }
      }
    }
    x0 += l;
  }
  out.max = max;
  out.x = xMax;
}
