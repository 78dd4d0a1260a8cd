/**
 * The reference rewriting of fill and of row insertion and deletion, table-driven; expected
 * texts are what a spreadsheet writes for the same copy or row operation (relative parts
 * move, `$` parts stay; Microsoft support, "Switch between relative, absolute, and mixed
 * references"), worked by hand.
 */
import fc from "fast-check";
import { formulaAfterRows, formulaShifter, mapReferences, shiftFormula } from "../../src/engine/references";
import { SHEET_LIMITS, SpanWorkbook } from "../../src/engine";

describe("shiftFormula (fill and paste)", () => {
  const cases: [string, number, number, string][] = [
    ["=A1+B2", 1, 0, "=A2+B3"],
    ["=A1+B2", 0, 2, "=C1+D2"],
    ["=$A$1+A$1+$A1+A1", 3, 1, "=$A$1+B$1+$A4+B4"],
    ["=SUM(B3:C9)", 2, 0, "=SUM(B5:C11)"],
    ["=Member!B3*'My sheet'!$C$4", 1, 1, "=Member!C4*'My sheet'!$C$4"],
    ['=SPAN.MAXMOMENT(A6,"udl 1 at B2",,,"1.2D+1.6L")', 1, 0, '=SPAN.MAXMOMENT(A7,"udl 1 at B2",,,"1.2D+1.6L")'],
    ["=LOG10(A1)*SPAN.X1", 1, 0, "=LOG10(A2)*SPAN.X1"],
    ["=SUM(H12#)", 1, 0, "=SUM(H13#)"],
    ["=A2-A1", -1, 0, "=A1-#REF!"],
    ["=B1", 0, -2, "=#REF!"],
    ["plain A1 text", 5, 5, "plain A1 text"],
    ["=SUM(A:A)+Rate1", 4, 0, "=SUM(A:A)+Rate1"],
  ];
  it.each(cases)("%s moved %i down, %i right reads %s", (formula, rows, cols, expected) => {
    expect(shiftFormula(formula, rows, cols, SHEET_LIMITS)).toBe(expected);
  });

  it("refuses a reference moved past the last row of the sheet", () => {
    expect(shiftFormula(`=A${SHEET_LIMITS.rows}`, 1, 0, SHEET_LIMITS)).toBe("=#REF!");
  });

  it("moving down then up again gives the formula back (invariant)", () => {
    for (const f of ["=A5+$B$2*C7", "=SUM(Member!B3:C9)/D$4", '=IF(A9>0,"A9",B9)'])
      for (const d of [1, 3, 17]) expect(shiftFormula(shiftFormula(f, d, d, SHEET_LIMITS), -d, -d, SHEET_LIMITS)).toBe(f);
  });

  it("sees every reference once, with its role in a range", () => {
    const seen: string[] = [];
    mapReferences("=SUM(A1:B2)+C3", SHEET_LIMITS, (r) => (seen.push(`${r.role}:${r.row},${r.col}`), r));
    expect(seen).toEqual(["start:0,0", "end:1,1", "single:2,2"]);
  });
});

describe("formulaAfterRows (insert and delete)", () => {
  const cases: [string, boolean, number, number, string][] = [
    // formula, formula on the sheet, at (0-based), count, expected
    ["=A1+A5+$A$7", true, 2, 2, "=A1+A7+$A$9"],
    ["=Other!A5", true, 2, 2, "=Other!A5"],
    ["=S!A5", false, 2, 2, "=S!A7"],
    ["=A5", false, 2, 2, "=A5"],
    ["=A2+A3+A6", true, 2, -2, "=A2+#REF!+A4"],
    ["=SUM(A2:A10)", true, 2, -2, "=SUM(A2:A8)"],
    ["=SUM(A3:A4)", true, 2, -2, "=SUM(A3:A2)"],
  ];
  it.each(cases)("%s (own sheet %s), rows at %i by %i: %s", (formula, own, at, count, expected) => {
    expect(formulaAfterRows(formula, "S", own, at, count, SHEET_LIMITS)).toBe(expected);
  });
});

describe("SpanWorkbook rows and reported changes", () => {
  it("inserts and deletes rows with formulas and A1# references following", () => {
    const book = new SpanWorkbook([{ name: "S", cells: [[1, 2, 3], ["=SEQUENCE(3)"], [], [], ["=SUM(A2#)", "=A1*2"]] }]);
    expect(book.getValue(0, 4, 0)).toBe(6);
    book.insertRows(0, 1, 2);
    expect(book.getFormula(0, 6, 0)).toBe("=SUM(A4#)");
    expect(book.getFormula(0, 6, 1)).toBe("=A1*2");
    expect(book.getValue(0, 6, 0)).toBe(6);
    book.deleteRows(0, 1, 2);
    expect(book.getFormula(0, 4, 0)).toBe("=SUM(A2#)");
    expect(book.getValue(0, 4, 0)).toBe(6);
    book.deleteRows(0, 0, 1);
    expect(book.getValue(0, 3, 1)).toMatchObject({ error: "#REF!" });
  });

  it("takes a leading apostrophe as text, kept in the input (what the grid's typed '5 relies on)", () => {
    const book = new SpanWorkbook([{ name: "S", cells: [["'5", "'=A1"]] }]);
    expect([book.getValue(0, 0, 0), book.getValue(0, 0, 1), book.getInput(0, 0, 0), book.getInput(0, 0, 1)]).toEqual(["5", "=A1", "'5", "'=A1"]);
  });

  it("reports the cells a change reaches: the cell, its dependents and the spill anchor", () => {
    const book = new SpanWorkbook([{ name: "S", cells: [[3], ["=SEQUENCE(A1)"], [], [], [], ["=A1*2"]] }]);
    const changed = book.setCellsReporting(0, 0, 0, [[2]]).map((a) => `${a.row},${a.col}`);
    expect(changed).toEqual(expect.arrayContaining(["0,0", "1,0", "2,0", "5,0"]));
    // The engine does not report the cell the shrunk spill left (A4): a grid repaints an old spill's cells itself.
    expect(changed).not.toContain("3,0");
    expect(book.getValue(0, 3, 0)).toBe(null);
    const grown = book.setCellsReporting(0, 0, 0, [[4]]).map((a) => `${a.row},${a.col}`);
    expect(grown).toEqual(expect.arrayContaining(["1,0", "2,0", "3,0", "4,0"]));
  });
});

describe("formulaShifter (one source formula, many offsets)", () => {
  // Formulas from pieces: references near both sheet edges (so some copies fall off: #REF!),
  // $ parts, sheet prefixes, ranges, strings that look like references, and plain text.
  const col = fc.oneof(fc.constantFrom("A", "B", "Z", "AA", "XFD", "XFC"), fc.constantFrom("C", "SR"));
  const row = fc.oneof(fc.integer({ min: 1, max: 30 }), fc.integer({ min: SHEET_LIMITS.rows - 3, max: SHEET_LIMITS.rows }));
  const cell = fc.tuple(fc.boolean(), col, fc.boolean(), row).map(([cd, c, rd, r]) => `${cd ? "$" : ""}${c}${rd ? "$" : ""}${r}`);
  const piece = fc.oneof(
    cell,
    fc.tuple(cell, cell).map(([a, b]) => `${a}:${b}`),
    cell.map((c) => `Other!${c}`),
    cell.map((c) => `'My sheet'!${c}`),
    cell.map((c) => `"${c}"`),
    fc.constantFrom("+", "*", ",", "SUM(", ")", "INDEX(", " ", "1.5", "A1#"),
  );
  const formula = fc.array(piece, { minLength: 1, maxLength: 8 }).map((ps) => `=${ps.join("")}`);
  const offset = fc.tuple(fc.integer({ min: -40, max: 40 }), fc.integer({ min: -3, max: 3 }));

  it("writes, for every offset in turn, the text mapReferences writes", () => {
    fc.assert(
      fc.property(formula, fc.array(offset, { minLength: 1, maxLength: 6 }), (f, offsets) => {
        const shift = formulaShifter(f, SHEET_LIMITS);
        for (const [rows, cols] of offsets) {
          const expected =
            rows === 0 && cols === 0
              ? f
              : mapReferences(f, SHEET_LIMITS, (ref) => ({ row: ref.rowAbsolute ? ref.row : ref.row + rows, col: ref.colAbsolute ? ref.col : ref.col + cols }));
          expect(shift(rows, cols)).toBe(expected);
        }
      }),
      { numRuns: 3000 },
    );
  });
});
