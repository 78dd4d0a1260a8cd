/**
 * The one place where errors become what the host shows. In the spreadsheet runtime the
 * runtime's CustomFunctions.Error is thrown with code #VALUE! or #N/A and the message; in
 * Node (no runtime) an object of the same shape is thrown: the solver's SpanError. Anything
 * unexpected becomes #VALUE! with a message, never a crash.
 */
import { SpanError, isSpanError, type ErrorCode } from "../core";

/** Longest message passed to the host (it shows a short text under the cell). */
export const MESSAGE_LIMIT = 255;

interface RuntimeErrors {
  Error: new (code: string, message?: string) => unknown;
  ErrorCode: { invalidValue: string; notAvailable: string };
}

/** The host's global (no `globalThis`: the functions' runtime on Windows supports ECMAScript 2016 only). */
declare const CustomFunctions: Partial<RuntimeErrors> | undefined;

function runtime(): RuntimeErrors | null {
  const candidate = typeof CustomFunctions === "undefined" ? undefined : CustomFunctions;
  if (candidate && typeof candidate.Error === "function" && candidate.ErrorCode) return candidate as RuntimeErrors;
  return null;
}

function clip(message: string): string {
  return message.length <= MESSAGE_LIMIT ? message : message.slice(0, MESSAGE_LIMIT - 3) + "...";
}

/** The code and message an exception stands for. */
export function describeError(error: unknown): { code: ErrorCode; message: string } {
  if (isSpanError(error)) return { code: error.code, message: clip(error.message) };
  const message = error instanceof Error ? error.message : String(error);
  return { code: "#VALUE!", message: clip(`unexpected problem: ${message}`) };
}

/** The value to throw to the host for an exception. */
export function hostError(error: unknown): unknown {
  const { code, message } = describeError(error);
  const host = runtime();
  if (host) {
    return new host.Error(code === "#N/A" ? host.ErrorCode.notAvailable : host.ErrorCode.invalidValue, message);
  }
  return new SpanError(code, message);
}

/** Runs a sheet function body, throwing only host-shaped errors. */
export function guarded<T>(body: () => T): T {
  try {
    return body();
  } catch (error) {
    throw hostError(error);
  }
}
