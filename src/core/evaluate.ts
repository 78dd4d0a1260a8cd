import { unavailable } from "./errors";
import { checkedPosition, positionTolerance } from "./positions";
import type { PieceTable, Quantity, Solution } from "./model";
import { pieceEndX, pieceOf, pieceStartX, scratchPiece } from "./pieceTable";
import { pieceValue } from "./polynomial";
import { cleanZero } from "./tolerance";

/** Index of the piece holding the value just right of x (the last piece at the member end). */
export function pieceIndexAt(pieces: PieceTable, x: number): number {
  let lo = 0;
  let hi = pieces.count - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (pieceStartX(pieces, mid) <= x) lo = mid;
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
function snapToPiece(pieces: PieceTable, index: number, x: number, tol: number): [number, number] {
  if (index + 1 < pieces.count && pieceStartX(pieces, index + 1) - x <= tol) return [index + 1, pieceStartX(pieces, index + 1)];
  const x0 = pieceStartX(pieces, index);
  if (x - x0 <= tol) return [index, x0];
  return [index, x];
}

/** The piece valueAt evaluates, reused (evaluation is synchronous). */
const scratch = scratchPiece();

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
  const x0 = pieceStartX(pieces, index);
  const s = solution.length - snapped <= tol ? pieceEndX(pieces, index) - x0 : snapped - x0;
  return cleanZero(pieceValue(pieceOf(pieces, index, scratch), quantity, s), solution.scales[quantity]);
}

/** valueAt for many positions. */
export function valuesAt(solution: Solution, quantity: Quantity, xs: number[]): number[] {
  return xs.map((x) => valueAt(solution, quantity, x));
}
