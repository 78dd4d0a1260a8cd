/**
 * Range arguments as the host delivers them: a 2-D array (rows of cells) for a range or a
 * single cell, or a bare value when called with a scalar (Node callers, formula engines).
 */
import { invalid } from "../core";
import { isBlank, isEmpty } from "./cells";

/** The rows of a range argument; a bare value is one cell, a 1-D array one row. */
export function rowsOf(arg: unknown): unknown[][] {
  if (!Array.isArray(arg)) return [[arg]];
  if (arg.length === 0) return [];
  if (!Array.isArray(arg[0])) return [arg];
  return arg as unknown[][];
}

/** The one value of a single-cell argument, or undefined when the argument is a larger range. */
export function singleCell(arg: unknown): unknown {
  if (!Array.isArray(arg)) return arg;
  if (arg.length !== 1) return arg.length === 0 ? null : undefined;
  const row = arg[0];
  if (!Array.isArray(row)) return row;
  return row.length === 1 ? row[0] : row.length === 0 ? null : undefined;
}

/** True when the argument was skipped or every cell in it is empty. */
export function isOmitted(arg: unknown): boolean {
  if (!Array.isArray(arg)) return isEmpty(arg);
  for (const row of arg) {
    if (Array.isArray(row)) {
      for (const cell of row) if (!isEmpty(cell)) return false;
    } else if (!isEmpty(row)) return false;
  }
  return true;
}

/** True when the argument was skipped or every cell in it is blank (empty or 0). */
export function isAllBlank(arg: unknown): boolean {
  if (!Array.isArray(arg)) return isBlank(arg);
  for (const row of arg) {
    if (Array.isArray(row)) {
      for (const cell of row) if (!isBlank(cell)) return false;
    } else if (!isBlank(row)) return false;
  }
  return true;
}

/**
 * The cells of a row or column argument, in order. A block of more than one row and more
 * than one column is an error naming the argument.
 */
export function vectorCells(arg: unknown, name: string): unknown[] {
  const rows = rowsOf(arg);
  if (rows.length <= 1) return rows.length === 0 ? [] : rows[0].slice();
  const width = rows[0].length;
  if (width === 1 || rows.every((row) => row.length <= 1)) return rows.map((row) => row[0]);
  throw invalid(`${name}: give a single row or column, got a block of ${rows.length} rows by ${width} columns`);
}

/** Splits a list written in one cell ("6 8 6", "6, 8, 6", "fixed pin free") into entries. */
export function splitList(text: string): string[] {
  return text.split(/[\s,]+/).filter((part) => part !== "");
}

/**
 * The entries of a list argument (spans, supports, EI): a single text cell is split on
 * spaces and commas, anything else gives its cells in order.
 */
export function listEntries(arg: unknown, name: string): unknown[] {
  const single = singleCell(arg);
  if (typeof single === "string" && !single.trim().startsWith("#")) return splitList(single);
  return single !== undefined ? [single] : vectorCells(arg, name);
}
