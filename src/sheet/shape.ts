/**
 * Result shapes. x may be a cell, a row, a column or a block: the result has the same shape,
 * with "" where an x cell is empty. Returned arrays never hold null, undefined or NaN.
 */
import { invalid } from "../core";
import { isEmpty, readNumber } from "./cells";
import { rowsOf } from "./ranges";

/** Names a position cell for messages: "x" for one cell, "x row 2, column 3" in a range. */
function xPlace(rows: unknown[][], r: number, c: number, name: string): string {
  return rows.length === 1 && rows[0].length === 1 ? name : `${name} row ${r + 1}, column ${c + 1}`;
}

/** Checks a result value is a finite number before it reaches the sheet. */
export function finite(value: number, what: string): number {
  if (!Number.isFinite(value)) throw invalid(`${what} is not a finite number; check the member's data`);
  return value;
}

function valueAtPosition(at: (position: number) => number, position: number, name: string): number {
  const value = at(position);
  if (!Number.isFinite(value)) throw invalid(`the value at ${name} = ${position} is not a finite number; check the member's data`);
  return value;
}

/** Evaluates `at` for every non-empty position cell, keeping the argument's shape (`name` in messages). */
export function mapPositions(x: unknown, at: (position: number) => number, name = "x"): (number | string)[][] {
  if (Array.isArray(x) && x.length === 1 && Array.isArray(x[0]) && x[0].length === 1 && typeof x[0][0] === "number") {
    const position = x[0][0];
    if (Number.isFinite(position)) return [[valueAtPosition(at, position, name)]];
  }
  const rows = rowsOf(x);
  if (rows.length === 0) throw invalid(`${name}: give a cell or a range of positions`);
  const width = rows.reduce((w, row) => Math.max(w, Array.isArray(row) ? row.length : 1), 0);
  const result: (number | string)[][] = new Array(rows.length);
  for (let r = 0; r < rows.length; r++) {
    const row = Array.isArray(rows[r]) ? rows[r] : [rows[r]];
    const out: (number | string)[] = new Array(width);
    for (let c = 0; c < width; c++) {
      const cell = c < row.length ? row[c] : "";
      if (isEmpty(cell)) {
        out[c] = "";
        continue;
      }
      const position = readNumber(cell, () => xPlace(rows, r, c, name));
      out[c] = valueAtPosition(at, position, name);
    }
    result[r] = out;
  }
  return result;
}

/** A number for the sheet, or "" when it is not available (NaN: slope without EI). */
export function orBlank(value: number): number | string {
  return Number.isNaN(value) ? "" : value;
}
