/**
 * Single cell values as the host delivers them: numbers, text, booleans, blanks ("", null,
 * undefined, and on some platforms 0) and error values (the runtime's error objects, or text
 * such as "#N/A"; in Node tests, objects with a `code`).
 */
import { invalid } from "../core";

const ERROR_TEXT =
  /^#(?:N\/A|VALUE!|REF!|DIV\/0!|NUM!|NAME\?|NULL!|SPILL!|CALC!|GETTING_DATA|BUSY!|FIELD!|CONNECT!|BLOCKED!|UNKNOWN!|PYTHON!|EXTERNAL!)$/;

/** Linear time: the digits before the point are one run, and the point starts its own group. */
const NUMBER_TEXT = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/** True for a cell with nothing in it: "", whitespace-only text, null or undefined (not 0). */
export function isEmpty(value: unknown): boolean {
  if (value === null || value === undefined || value === "") return true;
  return typeof value === "string" && value.trim() === "";
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

/** A number written as text ("6", " 2.5 ", "-1e3"), or null when the text is not one number. */
export function numberFromText(text: string): number | null {
  const trimmed = text.trim();
  if (!NUMBER_TEXT.test(trimmed)) return null;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : null;
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
