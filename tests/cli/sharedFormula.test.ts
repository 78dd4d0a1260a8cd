/**
 * Shared formulas (ECMA-376 Part 1 §18.3.1.40, t="shared"): a follower cell uses the first
 * cell's text with its relative references moved by its offset, as a fill would.
 */
import { shiftFormula } from "../../src/cli/sharedFormula";
import { scanSheet } from "../../src/cli/sheetXml";

describe("shiftFormula", () => {
  it.each([
    ["A1+B2", 2, 1, "B3+C4"],
    ["$A1+A$1+$A$1", 3, 2, "$A4+C$1+$A$1"],
    ["SUM(A1:B2)*LOG10(C3)", 1, 0, "SUM(A2:B3)*LOG10(C4)"],
    ['"A1"&A1', 1, 1, '"A1"&B2'],
    ["'Sheet A1'!B2+AB1!C3", 1, 0, "'Sheet A1'!B3+AB1!C4"],
    ["_xldudf_SPAN_MOMENT(B6,J6,$B$3)", 5, 0, "_xldudf_SPAN_MOMENT(B11,J11,$B$3)"],
    ["SUM(A:A)+SUM(1:2)", 1, 1, "SUM(B:B)+SUM(2:3)"],
    ["A1", -1, 0, "#REF!"],
    ["XFD1", 0, 1, "#REF!"],
  ])("%s moved by %i rows, %i columns is %s", (formula, rows, cols, expected) => {
    expect(shiftFormula(formula, rows, cols)).toBe(expected);
  });
});

describe("scanSheet", () => {
  it("places cells and rows without r after the previous ones, and reads prefixed tags", () => {
    const xml =
      '<x:worksheet xmlns:x="http://schemas.openxmlformats.org/spreadsheetml/2006/main"><x:sheetData>' +
      '<x:row><x:c><x:v>1</x:v></x:c><x:c t="inlineStr"><x:is><x:t>a&amp;b</x:t></x:is></x:c></x:row>' +
      '<x:row r="4"><x:c r="C4"><x:f t="shared" ref="C4:C5" si="0">A4*2</x:f><x:v>2</x:v></x:c></x:row>' +
      "</x:sheetData></x:worksheet>";
    const cells: unknown[] = [];
    scanSheet(xml, (cell) => cells.push({ row: cell.row, col: cell.col, value: cell.value, inline: cell.inline, formula: cell.formula?.text, si: cell.formula?.si }));
    expect(cells).toEqual([
      { row: 0, col: 0, value: "1", inline: undefined, formula: undefined, si: undefined },
      { row: 0, col: 1, value: undefined, inline: "a&b", formula: undefined, si: undefined },
      { row: 3, col: 2, value: "2", inline: undefined, formula: "A4*2", si: "0" },
    ]);
  });

  it("refuses cells out of order and a cell outside its row", () => {
    expect(() => scanSheet('<sheetData><row r="1"><c r="B1"/><c r="A1"/></row></sheetData>', () => undefined)).toThrow(/out of order/);
    expect(() => scanSheet('<sheetData><row r="2"><c r="A1"/></row></sheetData>', () => undefined)).toThrow(/does not belong to row 2/);
  });
});
