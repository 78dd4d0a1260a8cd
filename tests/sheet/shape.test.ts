import { finite, mapPositions, orBlank } from "../../src/sheet/shape";

const double = (x: number) => 2 * x;

describe("mapPositions keeps the shape of x", () => {
  test.each([
    ["bare number", 3, [[6]]],
    ["one cell", [[3]], [[6]]],
    ["row", [[1, 2, 3]], [[2, 4, 6]]],
    ["column", [[1], [2]], [[2], [4]]],
    ["block", [[1, 2], [3, 4]], [[2, 4], [6, 8]]],
    ["blank cells give \"\" (0 is a position)", [["", null, 0, "  "]], [["", "", 0, ""]]],
    ["numbers as text", [[" 1.5 ", "2"]], [[3, 4]]],
    ["ragged rows padded with \"\"", [[1, 2], [3]], [[2, 4], [6, ""]]],
  ])("%s", (_label, x, expected) => {
    expect(mapPositions(x, double)).toEqual(expected);
  });

  test.each([
    ["text in one cell", [["mid"]], /^x: "mid" is not a number$/],
    ["text in a range", [[1, 2], [3, "end"]], /^x row 2, column 2: "end" is not a number$/],
    ["error value", [[1, { code: "#N/A" }]], /x row 1, column 2: the cell holds the error #N\/A/],
    ["empty range", [], /x: give a cell or a range/],
  ])("%s is an error", (_label, x, message) => {
    expect(() => mapPositions(x, double)).toThrow(message);
  });

  test("a non-finite result is an error, never NaN in the sheet", () => {
    expect(() => mapPositions([[1]], () => NaN)).toThrow(/the value at x = 1 is not a finite number/);
  });
});

describe("finite and orBlank", () => {
  test("finite passes numbers and rejects NaN and infinities", () => {
    expect(finite(2, "v")).toBe(2);
    expect(() => finite(Infinity, "a reaction")).toThrow(/a reaction is not a finite number/);
  });
  test("orBlank turns NaN into \"\"", () => {
    expect(orBlank(NaN)).toBe("");
    expect(orBlank(0)).toBe(0);
  });
});
