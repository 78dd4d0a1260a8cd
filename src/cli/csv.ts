/**
 * CSV out of evaluated values (RFC 4180 quoting), safe to open in a spreadsheet:
 * - numbers with 15 significant digits, as the spreadsheet shows them (2.9999999999999996
 *   prints as 3);
 * - text that a spreadsheet would read as a formula (starting with =, +, -, @, tab or carriage
 *   return) gets a leading apostrophe, and the field is quoted (OWASP, "CSV Injection";
 *   OWASP ASVS 1.2.10).
 */
import { isCellError, type CellResult } from "../engine";

export const CSV_DIGITS = 15;

export function csvNumber(value: number): string {
  if (!Number.isFinite(value)) return "#NUM!";
  const rounded = Number(value.toPrecision(CSV_DIGITS));
  return Object.is(rounded, -0) ? "0" : String(rounded);
}

const FORMULA_START = new Set(["=", "+", "-", "@", "\t", "\r"]);

export function csvText(text: string): string {
  const guarded = text.length > 0 && FORMULA_START.has(text[0]) ? `'${text}` : text;
  return guarded !== text || /[",\n\r]/.test(guarded) ? `"${guarded.replace(/"/g, '""')}"` : guarded;
}

export function csvField(value: CellResult): string {
  if (value === null) return "";
  if (isCellError(value)) return value.error;
  if (typeof value === "number") return csvNumber(value);
  if (typeof value === "boolean") return value ? "TRUE" : "FALSE";
  return csvText(value);
}

export function toCsv(values: readonly (readonly CellResult[])[]): string {
  return values.map((row) => row.map(csvField).join(",")).join("\n") + "\n";
}
