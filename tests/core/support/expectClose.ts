/** Closeness checks that name what was compared, using only the tolerances in src/core/tolerance.ts. */
import { relDiff } from "../../../src/core/tolerance";

export function expectClose(label: string, actual: number, expected: number, rel: number, scale = 0): void {
  const diff = relDiff(actual, expected, scale);
  if (!(diff <= rel) || !Number.isFinite(actual)) {
    throw new Error(`${label}: got ${actual}, expected ${expected} (relative difference ${diff.toExponential(2)} > ${rel})`);
  }
}
