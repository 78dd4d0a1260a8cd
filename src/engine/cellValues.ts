/**
 * Values between the formula engine and the worksheet functions: arguments are handed over
 * the way the spreadsheet host hands them (ranges as 2-D arrays, blanks as "", a skipped
 * optional argument as null), and results come back as engine values or error values
 * carrying the function's message.
 */
import { CellError, EmptyValue, ErrorType, SimpleRangeValue } from "hyperformula";
import type { ArgumentKind } from "./catalogue";

type EngineScalar = number | string | boolean | CellError | typeof EmptyValue;

/** The first error among an argument's cells, if any. */
export function firstError(value: unknown): CellError | undefined {
  if (value instanceof CellError) return value;
  if (value instanceof SimpleRangeValue) {
    for (const row of value.rawData()) for (const cell of row) if (cell instanceof CellError) return cell;
  }
  return undefined;
}

function hostScalar(value: unknown): unknown {
  if (value === EmptyValue || value === undefined || value === null) return "";
  if (typeof value === "object" && value !== null && "val" in value) return (value as { val: unknown }).val;
  return value;
}

/** One argument as the host would pass it; `null` when the argument was skipped. */
export function hostArgument(value: unknown, kind: ArgumentKind, skipped: boolean): unknown {
  if (skipped) return null;
  if (value instanceof SimpleRangeValue) {
    const rows = value.rawData().map((row) => row.map(hostScalar));
    return kind === "block" ? rows : rows[0]?.[0] ?? "";
  }
  const scalar = hostScalar(value);
  return kind === "block" ? [[scalar]] : scalar;
}

function engineScalar(value: unknown): EngineScalar {
  if (value === null || value === undefined) return "";
  if (typeof value === "number") return Number.isFinite(value) ? value : new CellError(ErrorType.NUM, "the result is not a finite number");
  if (typeof value === "string" || typeof value === "boolean") return value;
  return String(value);
}

/** A function's 2-D result as an engine value: a single value for 1 x 1, otherwise a block (short rows padded with ""). */
export function engineResult(result: unknown): SimpleRangeValue | EngineScalar {
  if (!Array.isArray(result) || result.length === 0) return new CellError(ErrorType.VALUE, "the function returned no table");
  const rows = result as unknown[];
  let width = 0;
  for (let r = 0; r < rows.length; r++) {
    const row = rows[r];
    if (!Array.isArray(row) || row.length === 0) return new CellError(ErrorType.VALUE, "the function returned no table");
    if (row.length > width) width = row.length;
  }
  if (rows.length === 1 && width === 1) return engineScalar((rows[0] as unknown[])[0]);
  const data: EngineScalar[][] = [];
  for (let r = 0; r < rows.length; r++) {
    const row = rows[r] as unknown[];
    const out: EngineScalar[] = [];
    for (let col = 0; col < width; col++) out.push(engineScalar(row[col]));
    data.push(out);
  }
  return SimpleRangeValue.onlyValues(data as never);
}

/** A thrown `{ code, message }` (or anything else) as an engine error value with its message. */
export function engineError(thrown: unknown): CellError {
  if (thrown !== null && typeof thrown === "object" && "code" in thrown) {
    const { code, message } = thrown as { code: unknown; message?: unknown };
    const text = typeof message === "string" ? message : undefined;
    return new CellError(code === "#N/A" ? ErrorType.NA : ErrorType.VALUE, text);
  }
  const text = thrown instanceof Error ? thrown.message : String(thrown);
  return new CellError(ErrorType.VALUE, `unexpected failure: ${text}`);
}

export function resultSize(value: unknown): { rows: number; cols: number } | undefined {
  if (value instanceof SimpleRangeValue) return { rows: value.height(), cols: value.width() };
  if (value instanceof CellError) return undefined;
  return { rows: 1, cols: 1 };
}

/** The result cut or padded with "" to a block size (a single value for 1 x 1). */
export function resizeResult(result: SimpleRangeValue | EngineScalar, size: { rows: number; cols: number }): SimpleRangeValue | EngineScalar {
  const data = result instanceof SimpleRangeValue ? result.rawData() : [[result]];
  const rows = Array.from({ length: size.rows }, (_, r) => Array.from({ length: size.cols }, (_, c) => data[r]?.[c] ?? ""));
  if (size.rows === 1 && size.cols === 1) return rows[0][0] as EngineScalar;
  return SimpleRangeValue.onlyValues(rows as never);
}
