/**
 * A solution's pieces are one table of numbers (model.ts PieceTable): the conversions to and
 * from Piece objects are inverse, a slice copies the rows it names, and a
 * solved member's table holds exactly its own pieces (none of the solver's scratch rows).
 */
import { pieceList, pieceOf, pieceTableOf, solve, type Piece } from "../../src/core";
import { PIECE_FIELDS, slicePieces } from "../../src/core/pieceTable";
import { beam, point, udl } from "../../src/verify/members";

const piece = (i: number): Piece => ({
  x0: i,
  x1: i + 1,
  shear0: 10 * i + 1,
  moment0: -(10 * i + 2),
  slope0: 1e-3 * i,
  deflection0: -1e-4 * i,
  q0: 2.5 * i,
  q1: -0.5,
  flexibility: 1 / (1 + i),
  shearFlexibility: i % 2 === 0 ? 0 : 1e-6,
});

describe("piece table", () => {
  test.each([0, 1, 7])("%i pieces: pieceTableOf then pieceList gives them back, field by field", (n) => {
    const pieces = Array.from({ length: n }, (_, i) => piece(i));
    const table = pieceTableOf(pieces);
    expect(table.count).toBe(n);
    expect(table.data.length).toBe(n * PIECE_FIELDS);
    expect(pieceList(table)).toEqual(pieces);
    pieces.forEach((p, i) => expect(pieceOf(table, i)).toEqual(p));
  });

  test("a slice holds rows start to end, as a copy", () => {
    const table = pieceTableOf(Array.from({ length: 6 }, (_, i) => piece(i)));
    const part = slicePieces(table, 2, 5);
    expect(pieceList(part)).toEqual([piece(2), piece(3), piece(4)]);
    table.data[2 * PIECE_FIELDS] = 99;
    expect(pieceOf(part, 0).x0).toBe(2);
    expect(slicePieces(table, 3, 3).count).toBe(0);
  });

  test("a solved member's table holds exactly its pieces, contiguous from 0 to the member length", () => {
    const s = solve(beam([4, 5.5, 3], ["pin", "pin", "pin", "pin"], [udl(2, 0, 12.5), point(7, 2), point(3, 9.25)], 1e4));
    expect(s.pieces.data.length).toBe(s.pieces.count * PIECE_FIELDS);
    const list = pieceList(s.pieces);
    // 3 spans; a point load inside each of the first two adds one piece each.
    expect(list.length).toBe(5);
    expect(list[0].x0).toBe(0);
    expect(list[list.length - 1].x1).toBe(12.5);
    for (let i = 1; i < list.length; i++) expect(list[i].x0).toBe(list[i - 1].x1);
  });
});
