/**
 * Timing helpers for benchmarks (never used in jest). `measure` repeats fn until at least
 * `minMs` has passed (after a warm-up) and reports the mean time per call.
 */
export interface Timing {
  perCallMs: number;
  calls: number;
}

export function measure(fn: () => unknown, minMs = 300): Timing {
  const warmUntil = performance.now() + minMs / 4;
  while (performance.now() < warmUntil) fn();
  let calls = 0;
  const start = performance.now();
  let elapsed = 0;
  while (elapsed < minMs) {
    fn();
    calls++;
    elapsed = performance.now() - start;
  }
  return { perCallMs: elapsed / calls, calls };
}

/** Prints rows as an aligned text table. */
export function printTable(header: string[], rows: (string | number)[][]): void {
  const cells = [header, ...rows.map((r) => r.map(String))];
  const widths = header.map((_, c) => Math.max(...cells.map((r) => r[c].length)));
  for (const r of cells) console.log(r.map((v, c) => v.padStart(widths[c])).join("  "));
}
