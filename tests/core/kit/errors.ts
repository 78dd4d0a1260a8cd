/** Runs fn, expecting it to throw a SpanError; returns the error for code and message checks. */
import { isSpanError, type SpanError } from "../../../src/core";

export function thrown(fn: () => unknown): SpanError {
  try {
    fn();
  } catch (error) {
    if (isSpanError(error)) return error;
    throw new Error(`expected a SpanError, got ${String(error)}`);
  }
  throw new Error("expected a SpanError, but nothing was thrown");
}
