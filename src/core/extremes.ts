import { requireStiffness } from "./evaluate";
import type { Extreme, PieceTable, Quantity, Solution } from "./model";
import { MOMENT0, PIECE_FIELDS, pieceOf, Q0, Q1, scratchPiece, SHEAR0, X0, X1 } from "./pieceTable";
import { coefficients, derivative, momentAt, pieceValue, shearAt } from "./polynomial";
import { rootsBetween } from "./roots";
import { cleanZero, RELATIVE_ZERO } from "./tolerance";

export interface Candidate {
  x: number;
  value: number;
}

/** Scratch lists of candidate positions and values (gathering is synchronous and never re-entered). */
let capacity = 0;
let candidateX = new Float64Array(0);
let candidateValue = new Float64Array(0);
const roots = new Float64Array(2);
const piece = scratchPiece();

function ensureCapacity(n: number): void {
  if (capacity >= n) return;
  capacity = Math.max(n, 2 * capacity, 64);
  candidateX = new Float64Array(capacity);
  candidateValue = new Float64Array(capacity);
}

/**
 * Real roots strictly inside (0, hi) of c0 + c1 s + c2 s² (`terms` of them given) into
 * `roots`, ascending; returns how many. The same arithmetic as rootsBetween (trailing zero
 * terms dropped, the linear root, or the quadratic's stable pair), without building arrays.
 */
function lowRoots(terms: number, c0: number, c1: number, c2: number, hi: number): number {
  let n = terms;
  if (n === 3 && c2 === 0) n = 2;
  if (n === 2 && c1 === 0) n = 1;
  if (n === 2) {
    const s = -c0 / c1;
    if (!(s > 0 && s < hi)) return 0;
    roots[0] = s;
    return 1;
  }
  if (n !== 3) return 0;
  const disc = c1 * c1 - 4 * c2 * c0;
  if (disc < 0) return 0;
  const root = Math.sqrt(disc);
  const t = -0.5 * (c1 + (c1 >= 0 ? root : -root));
  let count = 0;
  if (t !== 0) {
    const s = c0 / t;
    if (s > 0 && s < hi) roots[count++] = s;
  }
  const s = t / c2;
  if (s > 0 && s < hi) roots[count++] = s;
  if (count === 2 && roots[1] < roots[0]) {
    const first = roots[1];
    roots[1] = roots[0];
    roots[0] = first;
  }
  return count;
}

/** Makes room for `more` candidates after the first n (keeping them); room for 4 a piece for the `left` pieces after. */
function makeRoom(n: number, more: number, left: number): void {
  if (n + more <= capacity) return;
  const x = candidateX.subarray(0, n).slice();
  const value = candidateValue.subarray(0, n).slice();
  ensureCapacity(n + more + 4 * left);
  candidateX.set(x);
  candidateValue.set(value);
}

/**
 * Every place a quantity can peak, into the scratch lists; returns how many: both ends of
 * every piece (so both sides of every jump) and every interior root of its derivative, found
 * from the polynomials themselves, each value cleaned against the quantity's scale. Shear and
 * moment (derivatives at most quadratic) take their roots and values in scalars.
 */
function gather(solution: Solution, quantity: Quantity): number {
  const { pieces } = solution;
  const scale = solution.scales[quantity];
  ensureCapacity(4 * pieces.count);
  if (quantity === "moment" || quantity === "shear") return gatherLow(pieces, quantity === "moment", scale);
  let n = 0;
  for (let i = 0; i < pieces.count; i++) {
    pieceOf(pieces, i, piece);
    const span = piece.x1 - piece.x0;
    const turning = rootsBetween(derivative(coefficients(piece, quantity)), 0, span);
    const inside = turning.length;
    makeRoom(n, inside + 2, pieces.count - i);
    candidateX[n] = piece.x0;
    candidateValue[n++] = cleanZero(pieceValue(piece, quantity, 0), scale);
    for (let k = 0; k < inside; k++) {
      const s = turning[k];
      candidateX[n] = piece.x0 + s;
      candidateValue[n++] = cleanZero(pieceValue(piece, quantity, s), scale);
    }
    candidateX[n] = piece.x1;
    candidateValue[n++] = cleanZero(pieceValue(piece, quantity, span), scale);
  }
  return n;
}

/** gather for moment (or shear): at most 2 interior roots a piece, so room for 4 a piece is always enough. */
function gatherLow(pieces: PieceTable, moment: boolean, scale: number): number {
  const d = pieces.data;
  let n = 0;
  for (let o = 0; o < pieces.count * PIECE_FIELDS; o += PIECE_FIELDS) {
    const v = d[o + SHEAR0];
    const m = d[o + MOMENT0];
    const q0 = d[o + Q0];
    const q1 = d[o + Q1];
    const x0 = d[o + X0];
    const x1 = d[o + X1];
    const span = x1 - x0;
    // The derivative's coefficients, i * c[i] of the quantity's own (polynomial.coefficients).
    const inside = moment ? lowRoots(3, 1 * v, 2 * (-q0 / 2), 3 * (-q1 / 6), span) : lowRoots(2, 1 * -q0, 2 * (-q1 / 2), 0, span);
    candidateX[n] = x0;
    candidateValue[n++] = cleanZero(moment ? momentAt(m, v, q0, q1, 0) : shearAt(v, q0, q1, 0), scale);
    for (let k = 0; k < inside; k++) {
      const s = roots[k];
      candidateX[n] = x0 + s;
      candidateValue[n++] = cleanZero(moment ? momentAt(m, v, q0, q1, s) : shearAt(v, q0, q1, s), scale);
    }
    candidateX[n] = x1;
    candidateValue[n++] = cleanZero(moment ? momentAt(m, v, q0, q1, span) : shearAt(v, q0, q1, span), scale);
  }
  return n;
}

/**
 * Every place a quantity can peak: both ends of every piece (so both sides of every jump)
 * and every interior root of its derivative, found from the polynomials themselves.
 */
export function candidates(solution: Solution, quantity: Quantity): Candidate[] {
  const n = gather(solution, quantity);
  const list = new Array<Candidate>(n);
  for (let i = 0; i < n; i++) list[i] = { x: candidateX[i], value: candidateValue[i] };
  return list;
}

/**
 * Largest and smallest value of a quantity over the member and where each occurs (the
 * leftmost x when the peak is reached more than once, to rounding).
 */
export function extremes(solution: Solution, quantity: Quantity): Extreme {
  requireStiffness(solution, quantity);
  const n = gather(solution, quantity);
  let max = -Infinity;
  let min = Infinity;
  for (let i = 0; i < n; i++) {
    const value = candidateValue[i];
    if (value > max) max = value;
    if (value < min) min = value;
  }
  const tol = 64 * RELATIVE_ZERO * Math.max(Math.abs(max), Math.abs(min));
  let xMax = Infinity;
  let xMin = Infinity;
  for (let i = 0; i < n; i++) {
    const value = candidateValue[i];
    const x = candidateX[i];
    if (value >= max - tol && x < xMax) xMax = x;
    if (value <= min + tol && x < xMin) xMin = x;
  }
  return { max, xMax, min, xMin };
}
