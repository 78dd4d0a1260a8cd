/**
 * The handbook cases, one list with two uses: tests/core/handbook.test.ts runs them in the test
 * suite, `spanwise verify` runs the same list and writes the verification document.
 */
import { cantileverCases } from "./cantilever";
import type { HandbookCase } from "./case";
import { indeterminateCases } from "./indeterminate";
import { simpleCases } from "./simple";
import { crosscheckCases } from "./crosscheck";

export type { HandbookCase } from "./case";
export { crosscheckCases } from "./crosscheck";

export const handbookCases: readonly HandbookCase[] = [...simpleCases, ...cantileverCases, ...indeterminateCases];

/** Every case `spanwise verify` runs: the handbook cases, then the independent-reference cases. */
export function verificationCases(): readonly HandbookCase[] {
  return [...handbookCases, ...crosscheckCases()];
}
