/** Direct calls of the worksheet functions, as the host would make them, for comparison. */
import type { CellResult } from "../../../src/engine";

/** The function's result, or the error cell it stands for when it throws `{ code, message }`. */
export function direct(fn: () => unknown[][]): CellResult[][] {
  try {
    return fn().map((row) => row.map((cell) => (cell === null || cell === undefined ? "" : (cell as CellResult))));
  } catch (thrown) {
    const { code, message } = thrown as { code: string; message: string };
    return [[{ error: code, message }]];
  }
}

/** A block of engine values with blanks as "" (spilled "" cells read back as "" or null). */
export function block(values: CellResult[][], top: number, left: number, rows: number, cols: number): CellResult[][] {
  return Array.from({ length: rows }, (_, r) =>
    Array.from({ length: cols }, (_, c) => {
      const value = values[top + r]?.[left + c];
      return value === null || value === undefined ? "" : value;
    }),
  );
}
