/**
 * Errors the core raises. `code` follows the spreadsheet's codes: "#VALUE!" for bad input,
 * "#N/A" for a result that cannot exist (slope without EI). The sheet layer turns these
 * into the host's error values; in Node they are thrown as they are.
 */
export type ErrorCode = "#VALUE!" | "#N/A";

export class SpanError extends Error {
  readonly code: ErrorCode;
  constructor(code: ErrorCode, message: string) {
    super(message);
    this.code = code;
    this.name = "SpanError";
  }
}

export function invalid(message: string): SpanError {
  return new SpanError("#VALUE!", message);
}

export function unavailable(message: string): SpanError {
  return new SpanError("#N/A", message);
}

export function isSpanError(value: unknown): value is SpanError {
  return value instanceof SpanError;
}
