import * as fc from "fast-check";
import { decimalValue, errorCodeOf, isBlank, isEmpty, NUMBER_TEXT, numberFromText, readNumber, readText, SHORT_DIGITS, shortDecimal, show } from "../../src/sheet/cells";

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

/** The definition the fast reader must match: the plain-decimal pattern, then Number() (correctly rounded), finite. */
function byDefinition(text: string): number | null {
  const trimmed = text.trim();
  if (!NUMBER_TEXT.test(trimmed)) return null;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : null;
}

describe("numberFromText reads without building strings, and equals the pattern and Number() bit for bit", () => {
  test.each([
    "0", "-0", "+0", "-0.0", "0.", ".0", "00012.5000", "0.1", "0.3", "-7.45", "123456789012345", "1234567890123456", "12345678901234567890",
    "9007199254740993", "0.000000000000000000001", "1e22", "1e23", "1.5e-22", "4.9e-324", "2e-324", "1.7976931348623157e308", "1.8e308",
    "1e-400", "0e99999999", "5e+3", "5E-3", ".", "+", "-", "e5", "1e", "1e+", "1.2.3", "1..2", " 1 ", "\u00a02\u00a0", "\ufeff3", "1 2", "",
    "1_000", "٣", "12345.678901234567", "0.1234567890123456789", "3.14159265358979323846", "8.25", "2.50",
  ])("%p", (text) => {
    expect(Object.is(numberFromText(text), byDefinition(text))).toBe(true);
  });

  test("random decimals of every length and exponent agree with the definition", () => {
    const digits = fc.stringMatching(/^[0-9]{0,22}$/);
    const text = fc
      .tuple(fc.constantFrom("", "+", "-"), digits, fc.constantFrom("", "."), digits, fc.constantFrom("", "e", "E"), fc.constantFrom("", "+", "-"), fc.integer({ min: 0, max: 330 }))
      .map(([sign, whole, point, fraction, e, eSign, exponent]) => `${sign}${whole}${point}${fraction}${e ? `${e}${eSign}${exponent}` : ""}`);
    fc.assert(
      fc.property(text, (t) => Object.is(numberFromText(t), byDefinition(t))),
      { numRuns: 20000, seed: 15 },
    );
  });

  test("a slice of a longer text reads as the slice alone", () => {
    expect(decimalValue("at 2.75;", 3, 7)).toBe(2.75);
    expect(Number.isNaN(decimalValue("at 2.75;", 3, 8))).toBe(true);
  });
});

describe("shortDecimal (digits gathered by a reader that splits text) equals decimalValue bit for bit", () => {
  /** The digits of a short decimal as a reader gathers them: sign, the digits as one integer, digits after the point. */
  function gathered(text: string): number {
    const negative = text.startsWith("-");
    const body = /^[+-]/.test(text) ? text.slice(1) : text;
    const point = body.indexOf(".");
    const mantissa = Number(body.replace(".", "") || "0");
    return shortDecimal(negative, mantissa, point < 0 ? 0 : body.length - point - 1);
  }

  test.each(["0", "-0", "+0", "-0.0", "0.", ".0", "-.5", "2.50", "8.25", "0.1", "0.3", "-7.45", "000000000000001", "123456789012345", "12345678.9012345", "0.00000000000001", "99999999999999.9"])(
    "%p",
    (text) => {
      expect(Object.is(gathered(text), decimalValue(text, 0, text.length))).toBe(true);
    },
  );

  test(`random decimals of at most ${SHORT_DIGITS} digits agree`, () => {
    const text = fc
      .tuple(fc.constantFrom("", "+", "-"), fc.stringMatching(/^[0-9]{1,15}$/), fc.integer({ min: -1, max: 15 }))
      .filter(([, digits, point]) => point <= digits.length)
      .map(([sign, digits, point]) => `${sign}${point < 0 ? digits : `${digits.slice(0, point)}.${digits.slice(point)}`}`);
    fc.assert(
      fc.property(text, (t) => Object.is(gathered(t), decimalValue(t, 0, t.length))),
      { numRuns: 20000, seed: 16 },
    );
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
