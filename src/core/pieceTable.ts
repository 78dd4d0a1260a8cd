import type { Piece, PieceTable } from "./model";

/**
 * The fields of a row of a PieceTable, in order: the fields of Piece (model.ts). Readers on
 * the solver's hot paths read the numbers in place; the others take Piece objects (pieceOf,
 * pieceList).
 */
export const X0 = 0;
export const X1 = 1;
export const SHEAR0 = 2;
export const MOMENT0 = 3;
export const SLOPE0 = 4;
export const DEFLECTION0 = 5;
export const Q0 = 6;
export const Q1 = 7;
export const FLEXIBILITY = 8;
export const SHEAR_FLEXIBILITY = 9;
/** Numbers per piece. */
export const PIECE_FIELDS = 10;

/** A piece of zeros, to be filled by pieceOf in a loop. */
export function scratchPiece(): Piece {
  return { x0: 0, x1: 0, shear0: 0, moment0: 0, slope0: 0, deflection0: 0, q0: 0, q1: 0, flexibility: 0, shearFlexibility: 0 };
}

/** Piece i as an object (into `out` when given: a scratch piece reused by a loop). */
export function pieceOf(table: PieceTable, i: number, out?: Piece): Piece {
  const d = table.data;
  const o = i * PIECE_FIELDS;
  const piece = out ?? ({} as Piece);
  piece.x0 = d[o + X0];
  piece.x1 = d[o + X1];
  piece.shear0 = d[o + SHEAR0];
  piece.moment0 = d[o + MOMENT0];
  piece.slope0 = d[o + SLOPE0];
  piece.deflection0 = d[o + DEFLECTION0];
  piece.q0 = d[o + Q0];
  piece.q1 = d[o + Q1];
  piece.flexibility = d[o + FLEXIBILITY];
  piece.shearFlexibility = d[o + SHEAR_FLEXIBILITY];
  return piece;
}

/** Every piece as an object, left to right. */
export function pieceList(table: PieceTable): Piece[] {
  const list = new Array<Piece>(table.count);
  for (let i = 0; i < table.count; i++) list[i] = pieceOf(table, i);
  return list;
}

/** A table holding these pieces, in this order. */
export function pieceTableOf(pieces: readonly Piece[]): PieceTable {
  const data: number[] = [];
  for (const p of pieces) data.push(p.x0, p.x1, p.shear0, p.moment0, p.slope0, p.deflection0, p.q0, p.q1, p.flexibility, p.shearFlexibility);
  return { count: pieces.length, data };
}

/** Pieces start (inclusive) to end (exclusive) of a table, as a table of their own (a copy of those rows). */
export function slicePieces(table: PieceTable, start: number, end: number): PieceTable {
  return { count: end - start, data: table.data.slice(start * PIECE_FIELDS, end * PIECE_FIELDS) };
}

/** Where piece i starts and ends. */
export const pieceStartX = (table: PieceTable, i: number): number => table.data[i * PIECE_FIELDS + X0];
export const pieceEndX = (table: PieceTable, i: number): number => table.data[i * PIECE_FIELDS + X1];
