/** Runs `action` and returns the SpanError it throws; fails the test when it throws nothing or something else. */
import { isSpanError } from "../../../src/core/errors";
import type { SpanError } from "../../../src/core/errors";

export function caught(action: () => unknown): SpanError {
  let thrown: unknown = undefined;
  let threw = false;
  try {
    action();
  } catch (error) {
    thrown = error;
    threw = true;
  }
  if (!threw) throw new Error("expected a SpanError, but nothing was thrown");
  if (!isSpanError(thrown)) throw new Error(`expected a SpanError, got ${String(thrown)}`);
  return thrown;
}
