import { readLoadTable } from "../../src/sheet/loadTable";
import type { LoadRow } from "../../src/sheet/loadRow";

function row(partial: Partial<LoadRow> & Pick<LoadRow, "kind" | "row">): LoadRow {
  return { magnitude: 0, xStart: 0, xEnd: null, magnitudeEnd: 0, loadCase: "", fromText: false, ...partial };
}

describe("readLoadTable: rows as the host delivers them", () => {
  test.each([
    ["full udl row", [["udl", 2.5, 0, 6, "", "D"]], [row({ kind: "udl", magnitude: 2.5, xStart: 0, xEnd: 6, loadCase: "D", row: 1 })]],
    ["udl with blank x end = member end", [["UDL", 2.5, "", "", "", ""]], [row({ kind: "udl", magnitude: 2.5, row: 1 })]],
    ["x end 0 = member end (blank as 0)", [["udl", 2.5, 1, 0, 0, 0]], [row({ kind: "udl", magnitude: 2.5, xStart: 1, row: 1 })]],
    ["x end null = member end", [["udl", 2, null, null, null, null]], [row({ kind: "udl", magnitude: 2, row: 1 })]],
    ["point load, numbers as text", [[" Point ", "10", " 3 ", "", "", "L"]], [row({ kind: "point", magnitude: 10, xStart: 3, loadCase: "L", row: 1 })]],
    ["moment, blank x start = 0", [["moment", -5, "", "", "", ""]], [row({ kind: "moment", magnitude: -5, row: 1 })]],
    ["linear", [["linear", 0, 0, 6, 6, "S"]], [row({ kind: "linear", magnitude: 0, xEnd: 6, magnitudeEnd: 6, loadCase: "S", row: 1 })]],
    ["fewer than six columns", [["point", 10, 3]], [row({ kind: "point", magnitude: 10, xStart: 3, row: 1 })]],
    ["two columns", [["udl", 1]], [row({ kind: "udl", magnitude: 1, row: 1 })]],
    [
      "blank rows skipped in all three forms; row numbers are rows of the range",
      [
        ["", "", "", "", "", ""],
        [null, null, null, null, null, null],
        [0, 0, 0, 0, 0, 0],
        ["point", 4, 2, "", "", ""],
      ],
      [row({ kind: "point", magnitude: 4, xStart: 2, row: 4 })],
    ],
    ["extra blank columns are fine", [["point", 1, 1, "", "", "D", "", 0]], [row({ kind: "point", magnitude: 1, xStart: 1, loadCase: "D", row: 1 })]],
    ["magnitude blank = 0", [["point", "", 1]], [row({ kind: "point", magnitude: 0, xStart: 1, row: 1 })]],
    ["empty table", [], []],
  ])("%s", (_label, rows, expected) => {
    expect(readLoadTable(rows as unknown[][])).toEqual(expected);
  });
});

describe("readLoadTable: errors name the row and column", () => {
  test.each([
    ["unknown type", [["", "", ""], ["pont", 10, 3]], /^load row 2, column 1 \(type\): "pont" is not a load type; use point, moment, udl, linear or settle$/],
    [
      "more than 5,000 loads (blank rows do not count)",
      [["", "", ""], ...Array.from({ length: 5001 }, () => ["point", 1, 2])],
      /^loads: at most 5000 loads on one member, got more \(row 5002 is one too many; combine loads that act together\)$/,
    ],
    ["blank type with data (zeros count as data only with a type)", [["", 10, 3]], /^load row 1, column 1 \(type\): the load type is blank/],
    ["numeric type", [[5, 10, 3]], /load row 1, column 1 \(type\): 5 is not a load type/],
    ["error in type", [[{ code: "#N/A" }, 10, 3]], /load row 1, column 1 \(type\): the cell holds the error #N\/A/],
    ["text magnitude", [["point", "ten", 3]], /^load row 1, column 2 \(magnitude\): "ten" is not a number$/],
    ["error magnitude", [["point", "#DIV/0!", 3]], /load row 1, column 2 \(magnitude\): the cell holds the error #DIV\/0!/],
    ["error object in x start", [["point", 1, { code: "#REF!" }]], /load row 1, column 3 \(x start\): the cell holds the error #REF!/],
    ["text x start", [["point", 1, "3m"]], /load row 1, column 3 \(x start\): "3m" is not a number/],
    ["text x end", [["udl", 1, 0, "end"]], /load row 1, column 4 \(x end\): "end" is not a number/],
    ["x end on a point load", [["point", 1, 2, 4]], /load row 1, column 4 \(x end\): 4 given, but a point load acts at x start only; leave it blank/],
    ["x end on a couple", [["moment", 1, 2, 4]], /load row 1, column 4 \(x end\): 4 given, but a couple acts at x start only/],
    ["x end on a settlement", [["settle", 0.01, 6, 8]], /^load row 1, column 4 \(x end\): 8 given, but a settlement acts at x start only; leave it blank$/],
    ["end magnitude on a settlement", [["settle", 0.01, 6, "", 2]], /^load row 1, column 5 \(magnitude at end\): 2 given, but only a linear load has a magnitude at end; leave it blank$/],
    ["end magnitude on a udl", [["udl", 1, 0, 4, 2]], /load row 1, column 5 \(magnitude at end\): 2 given, but only a linear load has a magnitude at end/],
    ["end magnitude on a point", [["point", 1, 0, "", 2]], /load row 1, column 5 \(magnitude at end\)/],
    ["error in an unused column", [["point", 1, 0, "#N/A"]], /load row 1, column 4 \(x end\): the cell holds the error #N\/A/],
    ["text end magnitude", [["linear", 1, 0, 4, "x"]], /load row 1, column 5 \(magnitude at end\): "x" is not a number/],
    ["case with a space", [["point", 1, 0, "", "", "dead load"]], /load row 1, column 6 \(case\): "dead load" is not a case label/],
    ["numeric case", [["point", 1, 0, "", "", 2]], /load row 1, column 6 \(case\): expected text, got 2/],
    ["error case", [["point", 1, 0, "", "", { code: "#N/A" }]], /load row 1, column 6 \(case\): the cell holds the error #N\/A/],
    ["seventh column with data", [["point", 1, 0, "", "", "D", "note"]], /load row 1, column 7: the load table has six columns/],
  ])("%s", (_label, rows, message) => {
    expect(() => readLoadTable(rows as unknown[][])).toThrow(message);
  });
});
