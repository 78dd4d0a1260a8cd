import { unavailable } from "./errors";
import { checkedPosition, positionTolerance } from "./positions";
import type { Piece, Quantity, Solution } from "./model";
import { pieceValue } from "./polynomial";
import { cleanZero } from "./tolerance";

/** Index of the piece holding the value just right of x (the last piece at the member end). */
export function pieceIndexAt(pieces: Piece[], x: number): number {
  let lo = 0;
  let hi = pieces.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (pieces[mid].x0 <= x) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

export function requireStiffness(solution: Solution, quantity: Quantity): void {
  if ((quantity === "slope" || quantity === "deflection") && !solution.hasStiffness) {
    throw unavailable(`${quantity} needs EI: give EI for the member or for each span`);
  }
}

/** Moves x onto the member end or a piece boundary when it is within rounding of one. */
function snapToPiece(pieces: Piece[], index: number, x: number, tol: number): [number, number] {
  const piece = pieces[index];
  if (index + 1 < pieces.length && pieces[index + 1].x0 - x <= tol) return [index + 1, pieces[index + 1].x0];
  if (x - piece.x0 <= tol) return [index, piece.x0];
  return [index, x];
}

/**
 * The value of a quantity at x: the value just right of x where it jumps, and just left at
 * the member's right end. Throws #VALUE! for x off the member and #N/A for slope or
 * deflection of a member solved without EI.
 */
export function valueAt(solution: Solution, quantity: Quantity, x: number): number {
  requireStiffness(solution, quantity);
  const position = checkedPosition(solution.nodeX, x, "x");
  const tol = positionTolerance(solution.length);
  const { pieces } = solution;
  const [index, snapped] = snapToPiece(pieces, pieceIndexAt(pieces, position), position, tol);
  const piece = pieces[index];
  const s = solution.length - snapped <= tol ? piece.x1 - piece.x0 : snapped - piece.x0;
  return cleanZero(pieceValue(piece, quantity, s), solution.scales[quantity]);
}

/** valueAt for many positions. */
export function valuesAt(solution: Solution, quantity: Quantity, xs: number[]): number[] {
  return xs.map((x) => valueAt(solution, quantity, x));
}
