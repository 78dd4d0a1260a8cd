import type { Piece, Quantity } from "./model";

/**
 * Coefficients, in powers of s = x - x0, of a quantity on a piece:
 * V = V0 - q0 s - q1 s²/2; M = M0 + V0 s - q0 s²/2 - q1 s³/6;
 * slope = θ0 - (M0 s + V0 s²/2 - q0 s³/6 - q1 s⁴/24)/EI (the rotation of the section);
 * deflection = w0 + θ0 s - (...)/EI + (V0 s - q0 s²/2 - q1 s³/6)/(G·A_v).
 */
export function coefficients(piece: Piece, quantity: Quantity): number[] {
  const { shear0: v, moment0: m, slope0: th, deflection0: w, q0, q1, flexibility: f } = piece;
  switch (quantity) {
    case "shear":
      return [v, -q0, -q1 / 2];
    case "moment":
      return [m, v, -q0 / 2, -q1 / 6];
    case "slope":
      return [th, -f * m, (-f * v) / 2, (f * q0) / 6, (f * q1) / 24];
    case "deflection": {
      const g = piece.shearFlexibility;
      if (g > 0) return [w, th + g * v, (-f * m) / 2 - (g * q0) / 2, (-f * v) / 6 - (g * q1) / 6, (f * q0) / 24, (f * q1) / 120];
      return [w, th, (-f * m) / 2, (-f * v) / 6, (f * q0) / 24, (f * q1) / 120];
    }
  }
}

/** Horner evaluation of c[0] + c[1] s + c[2] s² + ... */
export function evaluatePolynomial(c: number[], s: number): number {
  let value = 0;
  for (let i = c.length - 1; i >= 0; i--) value = value * s + c[i];
  return value;
}

export function derivative(c: number[]): number[] {
  const d: number[] = [];
  for (let i = 1; i < c.length; i++) d.push(i * c[i]);
  return d;
}

/**
 * The quantities at s = x - x0 of a piece given by its fields (v = shear0, m = moment0,
 * th = slope0, w = deflection0, f = flexibility, g = shearFlexibility): the one arithmetic of
 * a piece's values, shared by pieceValue and the solver's sweeps over pieces (same operations,
 * so the same bits, without a piece object or a quantity name).
 */
export function shearAt(v: number, q0: number, q1: number, s: number): number {
  return v - s * (q0 + (q1 * s) / 2);
}

export function momentAt(m: number, v: number, q0: number, q1: number, s: number): number {
  return m + s * (v - s * (q0 / 2 + (q1 * s) / 6));
}

export function slopeAt(th: number, m: number, v: number, q0: number, q1: number, f: number, s: number): number {
  return th - f * s * (m + s * (v / 2 - s * (q0 / 6 + (q1 * s) / 24)));
}

export function deflectionAt(w: number, th: number, m: number, v: number, q0: number, q1: number, f: number, g: number, s: number): number {
  const bending = w + th * s - f * (s * s) * (m / 2 + s * (v / 6 - s * (q0 / 24 + (q1 * s) / 120)));
  return g > 0 ? bending + g * s * (v - s * (q0 / 2 + (q1 * s) / 6)) : bending;
}

/** The value of a quantity on a piece at s = x - x0, without building coefficient arrays. */
export function pieceValue(piece: Piece, quantity: Quantity, s: number): number {
  const { shear0: v, moment0: m, q0, q1 } = piece;
  if (quantity === "shear") return shearAt(v, q0, q1, s);
  if (quantity === "moment") return momentAt(m, v, q0, q1, s);
  if (quantity === "slope") return slopeAt(piece.slope0, m, v, q0, q1, piece.flexibility, s);
  return deflectionAt(piece.deflection0, piece.slope0, m, v, q0, q1, piece.flexibility, piece.shearFlexibility, s);
}
