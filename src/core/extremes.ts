import { requireStiffness } from "./evaluate";
import type { Extreme, Quantity, Solution } from "./model";
import { coefficients, derivative, pieceValue } from "./polynomial";
import { rootsBetween } from "./roots";
import { cleanZero, RELATIVE_ZERO } from "./tolerance";

export interface Candidate {
  x: number;
  value: number;
}

/**
 * Every place a quantity can peak: both ends of every piece (so both sides of every jump)
 * and every interior root of its derivative, found from the polynomials themselves.
 */
export function candidates(solution: Solution, quantity: Quantity): Candidate[] {
  const list: Candidate[] = [];
  const scale = solution.scales[quantity];
  const at = (piece: Solution["pieces"][number], s: number): number => cleanZero(pieceValue(piece, quantity, s), scale);
  for (const piece of solution.pieces) {
    const span = piece.x1 - piece.x0;
    list.push({ x: piece.x0, value: at(piece, 0) });
    const slope = derivative(coefficients(piece, quantity));
    for (const s of rootsBetween(slope, 0, span)) list.push({ x: piece.x0 + s, value: at(piece, s) });
    list.push({ x: piece.x1, value: at(piece, span) });
  }
  return list;
}

/**
 * Largest and smallest value of a quantity over the member and where each occurs (the
 * leftmost x when the peak is reached more than once, to rounding).
 */
export function extremes(solution: Solution, quantity: Quantity): Extreme {
  requireStiffness(solution, quantity);
  const list = candidates(solution, quantity);
  let max = -Infinity;
  let min = Infinity;
  for (const c of list) {
    if (c.value > max) max = c.value;
    if (c.value < min) min = c.value;
  }
  const tol = 64 * RELATIVE_ZERO * Math.max(Math.abs(max), Math.abs(min));
  let xMax = Infinity;
  let xMin = Infinity;
  for (const c of list) {
    if (c.value >= max - tol && c.x < xMax) xMax = c.x;
    if (c.value <= min + tol && c.x < xMin) xMin = c.x;
  }
  return { max, xMax, min, xMin };
}
