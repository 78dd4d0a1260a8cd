/**
 * Evaluates a solution piece from its documented fields alone (model.ts): the load
 * q0 + q1·s, V' = -q, M' = V, slope' = -M·flexibility (M = -EI w''), deflection' = slope.
 * Written here from the conventions, so tests can read both ends of a piece exactly.
 */
import type { Piece, Quantity } from "../../../src/core";

export function pieceAt(p: Piece, quantity: Quantity, s: number): number {
  const { shear0: V, moment0: M, slope0: t, deflection0: w, q0, q1, flexibility: k } = p;
  switch (quantity) {
    case "shear":
      return V - q0 * s - (q1 * s * s) / 2;
    case "moment":
      return M + V * s - (q0 * s * s) / 2 - (q1 * s ** 3) / 6;
    case "slope":
      return t - k * (M * s + (V * s * s) / 2 - (q0 * s ** 3) / 6 - (q1 * s ** 4) / 24);
    case "deflection":
      return w + t * s - k * ((M * s * s) / 2 + (V * s ** 3) / 6 - (q0 * s ** 4) / 24 - (q1 * s ** 5) / 120);
  }
}

/** Value at the left end (just right of x0) and at the right end (just left of x1). */
export const pieceStart = (p: Piece, q: Quantity): number => pieceAt(p, q, 0);
export const pieceEnd = (p: Piece, q: Quantity): number => pieceAt(p, q, p.x1 - p.x0);
