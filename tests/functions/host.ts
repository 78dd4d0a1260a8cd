/**
 * Calling the exports the way the host does, and catching what they throw.
 * Not a test file: helpers shared by tests/functions.
 */
import { tolerance } from "../../src/core";

export interface Thrown {
  code: string;
  message: string;
}

/** Calls `call` and returns what it threw (failing the test when it returned). */
export function thrown(call: () => unknown): Thrown {
  try {
    const value = call();
    throw new Error(`expected an error, got ${JSON.stringify(value)}`);
  } catch (e) {
    if (e instanceof Error && e.message.startsWith("expected an error")) throw e;
    return e as Thrown;
  }
}

/** Every cell is a finite number or "" (never null, undefined or NaN). */
export function isSheetSafe(result: unknown[][]): boolean {
  return result.every((row) => row.every((cell) => cell === "" || typeof cell === "string" || (typeof cell === "number" && Number.isFinite(cell))));
}

/** Relative agreement at the handbook tolerance; an expected 0 is compared against `scale`. */
export function close(actual: unknown, expected: number, scale = 1): boolean {
  if (typeof actual !== "number") return false;
  return expected === 0 ? Math.abs(actual) <= tolerance.HANDBOOK_TOLERANCE * scale : tolerance.relClose(actual, expected, tolerance.HANDBOOK_TOLERANCE);
}

/** The three forms a blank cell can arrive in. */
export const BLANKS: readonly unknown[] = ["", null, 0];
