import { errorCodeOf, isBlank, isEmpty, numberFromText, readNumber, readText, show } from "../../src/sheet/cells";

const where = () => "load row 2, column 3 (x start)";

describe("blank cells", () => {
  test.each([
    ["", true, true],
    [null, true, true],
    [undefined, true, true],
    ["   ", true, true],
    [0, false, true],
    ["0", false, false],
    [1, false, false],
    ["pin", false, false],
  ])("%p: empty %p, blank %p", (value, empty, blank) => {
    expect(isEmpty(value)).toBe(empty);
    expect(isBlank(value)).toBe(blank);
  });
});

describe("error values a cell can hold", () => {
  test.each([
    ["#N/A", "#N/A"],
    [" #DIV/0! ", "#DIV/0!"],
    ["#REF!", "#REF!"],
    ["#NAME?", "#NAME?"],
    [{ code: "#VALUE!", message: "x" }, "#VALUE!"],
    [{ code: "NUM!" }, "#NUM!"],
    [{ errorCode: "#N/A" }, "#N/A"],
    [{ type: "Error" }, "#VALUE!"],
    [NaN, "#NUM!"],
    [Infinity, "#NUM!"],
    ["#hashtag", null],
    ["N/A", null],
    [3, null],
    ["", null],
  ])("%p -> %p", (value, code) => {
    expect(errorCodeOf(value)).toBe(code);
  });
});

describe("numbers stored as text", () => {
  test.each([
    ["6", 6],
    [" 2.5 ", 2.5],
    ["-3", -3],
    ["+4.", 4],
    [".5", 0.5],
    ["1e3", 1000],
    ["2.5E-2", 0.025],
    ["", null],
    ["6 m", null],
    ["0x10", null],
    ["1,5", null],
    ["Infinity", null],
    ["1e999", null],
    ["--1", null],
  ])("%p -> %p", (text, value) => {
    expect(numberFromText(text)).toBe(value);
  });
});

describe("readNumber", () => {
  test.each([
    [4, undefined, 4],
    ["4.5", undefined, 4.5],
    ["", 0, 0],
    [null, 7, 7],
  ])("%p (blank %p) -> %p", (value, blank, expected) => {
    expect(readNumber(value, where, blank)).toBe(expected);
  });

  test.each([
    ["", undefined, /load row 2, column 3 \(x start\): the cell is blank/],
    ["abc", 0, /load row 2, column 3 \(x start\): "abc" is not a number/],
    [true, 0, /TRUE is not a number/],
    ["#N/A", 0, /holds the error #N\/A/],
    [{ code: "#DIV/0!" }, 0, /holds the error #DIV\/0!/],
    [NaN, 0, /holds the error #NUM!/],
  ])("%p is an error naming the cell", (value, blank, message) => {
    expect(() => readNumber(value, where, blank)).toThrow(message);
    try {
      readNumber(value, where, blank);
    } catch (e) {
      expect((e as { code: string }).code).toBe("#VALUE!");
    }
  });
});

describe("readText and show", () => {
  test("text is trimmed, blanks are empty, other values are errors", () => {
    expect(readText("  D ", where)).toBe("D");
    expect(readText(null, where)).toBe("");
    expect(() => readText(5, where)).toThrow(/expected text, got 5/);
    expect(() => readText("#REF!", where)).toThrow(/holds the error #REF!/);
    expect(() => readText({ code: "#N/A" }, where)).toThrow(/holds the error #N\/A/);
  });

  test.each([
    [5, "5"],
    ["a", '"a"'],
    [false, "FALSE"],
    [{ code: "#N/A" }, "#N/A"],
  ])("show(%p) = %p", (value, text) => {
    expect(show(value)).toBe(text);
  });
});
