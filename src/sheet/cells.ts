/**
 * Single cell values as the host delivers them: numbers, text, booleans, blanks ("", null,
 * undefined, and on some platforms 0) and error values (the runtime's error objects, or text
 * such as "#N/A"; in Node tests, objects with a `code`).
 */
import { invalid } from "../core";

const ERROR_TEXT =
  /^#(?:N\/A|VALUE!|REF!|DIV\/0!|NUM!|NAME\?|NULL!|SPILL!|CALC!|GETTING_DATA|BUSY!|FIELD!|CONNECT!|BLOCKED!|UNKNOWN!|PYTHON!|EXTERNAL!)$/;

/** Linear time: the digits before the point are one run, and the point starts its own group. */
export const NUMBER_TEXT = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/** True for a cell with nothing in it: "", whitespace-only text, null or undefined (not 0). */
export function isEmpty(value: unknown): boolean {
  if (value === null || value === undefined || value === "") return true;
  if (typeof value !== "string") return false;
  // A text starting with a printable ASCII character is not blank (no trimmed copy needed).
  const first = value.charCodeAt(0);
  return !(first > 32 && first < 127) && value.trim() === "";
}

/** True for a cell that counts as blank where a blank and a zero mean the same: empty or 0. */
export function isBlank(value: unknown): boolean {
  return value === 0 || isEmpty(value);
}

/** The error code a cell holds ("#N/A", "#DIV/0!", ...), or null when it holds no error. */
export function errorCodeOf(value: unknown): string | null {
  if (typeof value === "string") {
    if (value.indexOf("#") < 0) return null;
    const trimmed = value.trim();
    return ERROR_TEXT.test(trimmed) ? trimmed : null;
  }
  if (typeof value === "object" && value !== null) {
    const code = (value as { code?: unknown; errorCode?: unknown }).code ?? (value as { errorCode?: unknown }).errorCode;
    if (typeof code === "string") return code.startsWith("#") ? code : `#${code}`;
    return "#VALUE!";
  }
  if (typeof value === "number" && !Number.isFinite(value)) return "#NUM!";
  return null;
}

/** Powers of ten that are exact doubles (10^0 to 10^22). */
const EXACT_POWERS = [1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22];

/** Significant digits a mantissa may hold and stay an exact double (10^15 < 2^53). */
const EXACT_DIGITS = 15;

/** Most digits (leading zeros included) a decimal without exponent may have for shortDecimal. */
export const SHORT_DIGITS = EXACT_DIGITS;

/**
 * The value of a decimal without exponent of at most SHORT_DIGITS digits, from its digits read
 * as one integer `mantissa`, the count of digits after its point, and its sign: the same
 * product or quotient of two exact doubles decimalValue computes for that text (so the same
 * bits, -0 included), for readers that gather the digits while they split the text.
 */
export function shortDecimal(negative: boolean, mantissa: number, fraction: number): number {
  const magnitude = fraction > 0 ? mantissa / EXACT_POWERS[fraction] : mantissa;
  return negative ? -magnitude : magnitude;
}

/**
 * The value of text[start, end) when it is one plain decimal (NUMBER_TEXT: sign, digits with an
 * optional point, optional exponent) and finite, else NaN; read without building strings. With
 * at most 15 significant digits and a power of ten up to 10^22 either way, the value is one
 * correctly rounded product or quotient of two exact doubles, which is what Number() gives
 * (correctly rounded decimal conversion); any other text is handed to Number() itself.
 */
export function decimalValue(text: string, start: number, end: number): number {
  let i = start;
  let negative = false;
  let c = i < end ? text.charCodeAt(i) : 0;
  if (c === 43 || c === 45) {
    negative = c === 45;
    c = ++i < end ? text.charCodeAt(i) : 0;
  }
  let mantissa = 0;
  let significant = 0;
  let digits = 0;
  let fraction = 0;
  let exact = true;
  while (c >= 48 && c <= 57) {
    if (mantissa !== 0 || c !== 48) {
      if (significant < EXACT_DIGITS) mantissa = mantissa * 10 + (c - 48);
      else exact = false;
      significant++;
    }
    digits++;
    c = ++i < end ? text.charCodeAt(i) : 0;
  }
  if (c === 46) {
    c = ++i < end ? text.charCodeAt(i) : 0;
    while (c >= 48 && c <= 57) {
      if (mantissa !== 0 || c !== 48) {
        if (significant < EXACT_DIGITS) mantissa = mantissa * 10 + (c - 48);
        else exact = false;
        significant++;
      }
      digits++;
      fraction++;
      c = ++i < end ? text.charCodeAt(i) : 0;
    }
  }
  if (digits === 0) return NaN;
  let exponent = 0;
  if (i < end && (c === 101 || c === 69)) {
    c = ++i < end ? text.charCodeAt(i) : 0;
    let negativeExponent = false;
    if (c === 43 || c === 45) {
      negativeExponent = c === 45;
      c = ++i < end ? text.charCodeAt(i) : 0;
    }
    let exponentDigits = 0;
    while (c >= 48 && c <= 57) {
      if (exponent < 1e6) exponent = exponent * 10 + (c - 48);
      else exact = false;
      exponentDigits++;
      c = ++i < end ? text.charCodeAt(i) : 0;
    }
    if (exponentDigits === 0) return NaN;
    if (negativeExponent) exponent = -exponent;
  }
  if (i !== end) return NaN;
  const power = exponent - fraction;
  if (exact && (mantissa === 0 || (power >= -22 && power <= 22))) {
    const magnitude = mantissa === 0 ? 0 : power >= 0 ? mantissa * EXACT_POWERS[power] : mantissa / EXACT_POWERS[-power];
    return negative ? -magnitude : magnitude;
  }
  const value = Number(start === 0 && end === text.length ? text : text.slice(start, end));
  return Number.isFinite(value) ? value : NaN;
}

/** True for a character code String.prototype.trim never removes, below 128 (printable ASCII). */
function isPrintable(code: number): boolean {
  return code > 32 && code < 127;
}

/** A number written as text ("6", " 2.5 ", "-1e3"), or null when the text is not one number (NUMBER_TEXT). */
export function numberFromText(text: string): number | null {
  const n = text.length;
  const trimmed = n > 0 && isPrintable(text.charCodeAt(0)) && isPrintable(text.charCodeAt(n - 1)) ? text : text.trim();
  const value = decimalValue(trimmed, 0, trimmed.length);
  return value === value ? value : null;
}

/** How a cell value reads in a message: numbers plain, text quoted. */
export function show(value: unknown): string {
  if (typeof value === "number") return String(value);
  if (typeof value === "string") return JSON.stringify(value);
  if (typeof value === "boolean") return value ? "TRUE" : "FALSE";
  const code = errorCodeOf(value);
  return code ?? String(value);
}

/**
 * Reads a number cell. `where` names the cell for messages ("load row 2, column 3 (x start)").
 * Empty cells give `blank`, or an error when `blank` is undefined; error values, booleans and
 * text that is not a number are errors.
 */
export function readNumber(value: unknown, where: () => string, blank?: number): number {
  if (typeof value === "number" && Number.isFinite(value)) return value;
  if (typeof value === "string") {
    const parsed = numberFromText(value);
    if (parsed !== null) return parsed;
  }
  if (isEmpty(value)) {
    if (blank !== undefined) return blank;
    throw invalid(`${where()}: the cell is blank; give a number`);
  }
  const code = errorCodeOf(value);
  if (code !== null) throw invalid(`${where()}: the cell holds the error ${code}`);
  throw invalid(`${where()}: ${show(value)} is not a number`);
}

/** Reads a text cell (trimmed); numbers, booleans and error values are errors. */
export function readText(value: unknown, where: () => string): string {
  if (typeof value === "string") {
    const code = errorCodeOf(value);
    if (code !== null) throw invalid(`${where()}: the cell holds the error ${code}`);
    return value.trim();
  }
  if (isEmpty(value)) return "";
  const code = errorCodeOf(value);
  if (code !== null) throw invalid(`${where()}: the cell holds the error ${code}`);
  throw invalid(`${where()}: expected text, got ${show(value)}`);
}
