/**
 * What a worksheet function may do with any input: return a rectangular 2-D array of finite
 * numbers and strings of the documented shape, or throw a coded error (#VALUE! or #N/A) with
 * a message of its own. Anything else — null, undefined, NaN, Infinity, booleans, ragged or
 * mis-shaped arrays, a thrown TypeError, an empty message, or an internal crash wrapped as
 * "unexpected problem" — is a violation. Not a test file.
 */

export type Outcome = { kind: "value"; value: unknown } | { kind: "error"; thrown: unknown };

/** Runs a call and records what came back or what was thrown. */
export function outcomeOf(call: () => unknown): Outcome {
  try {
    return { kind: "value", value: call() };
  } catch (thrown) {
    return { kind: "error", thrown };
  }
}

/** A documented result shape: exact rows/columns where known, or bounds. */
export interface Shape {
  rows?: number;
  cols?: number;
  minRows?: number;
  /** Extra checks on the cells (labels in column 0, numbers in x columns...). */
  cells?: (value: unknown[][]) => string | null;
}

function cellProblem(cell: unknown): string | null {
  if (typeof cell === "string") return null;
  if (typeof cell === "number") return Number.isFinite(cell) ? null : `a non-finite number ${cell}`;
  return `a ${cell === null ? "null" : typeof cell} cell`;
}

/** Every violation of the contract in one outcome; an empty list means the call failed safe. */
export function violations(outcome: Outcome, shape: Shape): string[] {
  if (outcome.kind === "error") {
    const e = outcome.thrown as { code?: unknown; message?: unknown } | null;
    if (e === null || typeof e !== "object" || e instanceof TypeError || e instanceof RangeError) return [`threw ${String(e)}, not a coded error`];
    const problems: string[] = [];
    if (e.code !== "#VALUE!" && e.code !== "#N/A") problems.push(`error code ${String(e.code)} is neither #VALUE! nor #N/A`);
    if (typeof e.message !== "string" || e.message.trim() === "") problems.push("error without a message");
    else if (/^unexpected problem/.test(e.message)) problems.push(`an internal failure reached the sheet: ${e.message}`);
    return problems;
  }
  const value = outcome.value;
  if (!Array.isArray(value) || value.length === 0 || !value.every((row) => Array.isArray(row))) return [`returned ${JSON.stringify(value)}, not a 2-D array`];
  const rows = value as unknown[][];
  const problems: string[] = [];
  const width = rows[0].length;
  if (width === 0) problems.push("an empty row");
  if (!rows.every((row) => row.length === width)) problems.push("rows of different lengths");
  for (let r = 0; r < rows.length && problems.length < 3; r++) {
    for (let c = 0; c < rows[r].length; c++) {
      const p = cellProblem(rows[r][c]);
      if (p) {
        problems.push(`row ${r + 1}, column ${c + 1}: ${p}`);
        break;
      }
    }
  }
  if (shape.rows !== undefined && rows.length !== shape.rows) problems.push(`${rows.length} rows, expected ${shape.rows}`);
  if (shape.minRows !== undefined && rows.length < shape.minRows) problems.push(`${rows.length} rows, expected at least ${shape.minRows}`);
  if (shape.cols !== undefined && width !== shape.cols) problems.push(`${width} columns, expected ${shape.cols}`);
  if (problems.length === 0 && shape.cells) {
    const p = shape.cells(rows);
    if (p) problems.push(p);
  }
  return problems;
}

/** The shape a range argument has on the sheet: a bare value is one cell. */
export function shapeOfArg(arg: unknown): { rows: number; cols: number } {
  if (!Array.isArray(arg)) return { rows: 1, cols: 1 };
  if (arg.length === 0) return { rows: 0, cols: 0 };
  return { rows: arg.length, cols: Math.max(...arg.map((row) => (Array.isArray(row) ? row.length : 1))) };
}

/** Column `c` holds numbers (x positions, ratios) wherever it is not blank. */
export function numericColumn(c: number, what: string): (value: unknown[][]) => string | null {
  return (value) => (value.every((row) => typeof row[c] === "number" || row[c] === "") ? null : `column ${c + 1} (${what}) holds text`);
}

/** Column 0 holds these labels, in this order. */
export function labels(expected: readonly string[][]): (value: unknown[][]) => string | null {
  return (value) => {
    const got = value.map((row) => row[0]);
    return expected.some((e) => e.length === got.length && e.every((l, i) => l === got[i])) ? null : `labels ${JSON.stringify(got)}`;
  };
}

export function both(...checks: ((value: unknown[][]) => string | null)[]): (value: unknown[][]) => string | null {
  return (value) => {
    for (const check of checks) {
      const p = check(value);
      if (p) return p;
    }
    return null;
  };
}
