/**
 * Timing helpers for benchmarks (never used in jest). `measure` repeats fn until at least
 * `minMs` has passed (after a warm-up) and reports the mean time per call. Also the pieces the
 * benches share: medians, CPU time, the load average, the production bundle, and issue 15's
 * target lines (`reportTarget`, collected by targets.bench.ts).
 */
import * as fs from "fs";
import { createRequire } from "module";
import * as os from "os";
import * as path from "path";

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

/** Median of a list of numbers (the mean of the middle two of an even count). */
export function median(values: number[]): number {
  const sorted = values.slice().sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/** The lowest and highest of a list, "13.3-22.1" (`digits` after the point). */
export function rangeText(values: number[], digits = 1): string {
  const sorted = values.slice().sort((a, b) => a - b);
  return `${sorted[0].toFixed(digits)}-${sorted[sorted.length - 1].toFixed(digits)}`;
}

/** CPU time of this process in ms (user + system): on a loaded machine it counts only the time this process ran. */
export function cpuMs(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
}

/** The 1, 5 and 15 minute load averages, as `uptime` prints them (or with fewer decimals). */
export function loadAverage(decimals = 2): string {
  return os.loadavg().map((v) => v.toFixed(decimals)).join(" ");
}

/** The production functions bundle as users run it (`npx webpack --mode production`). */
export const DIST_FUNCTIONS = path.join(__dirname, "..", "..", "dist", "functions.js");

type Fn = (...args: any[]) => any;

/** Refuses to measure a build that is not there, naming the command that makes it. */
export function requireBuilt(file = DIST_FUNCTIONS): void {
  if (!fs.existsSync(file)) throw new Error(`${file} is missing: run npx webpack --mode production first`);
}

/**
 * The worksheet functions of a production functions bundle, loaded with a stand-in
 * CustomFunctions that records what the bundle associates (the bundle is a plain script with
 * no module exports), so the code measured is the code users run.
 */
export function loadBundle(file = DIST_FUNCTIONS): Record<string, Fn> {
  requireBuilt(file);
  const functions: Record<string, Fn> = {};
  const host = globalThis as { CustomFunctions?: unknown };
  const previous = host.CustomFunctions;
  host.CustomFunctions = { associate: (name: string, fn: Fn) => (functions[name] = fn) };
  try {
    createRequire(__filename)(file);
  } finally {
    host.CustomFunctions = previous;
  }
  return functions;
}

/**
 * One of issue 15's targets, as measured. `ratio` is the number held against `limit`: the
 * ratio the target names (a row to the yardstick, 1,000 spans to 100, a calc to `node -e 0`,
 * solves to members), or for a target given in units the measured value over the allowed one
 * (`ratioOf` says which).
 */
export interface TargetResult {
  /** Short name: "per row (text cells)". */
  target: string;
  /** What was measured, with units. */
  measured: string;
  ratio: number;
  /** What the ratio is of: "x the yardstick", "of 20 ms". */
  ratioOf: string;
  limit: number;
  /** The ratio must be below the limit (start-up: "under 10 times"); otherwise at most the limit. */
  below?: boolean;
}

export function passes(t: TargetResult): boolean {
  return t.below ? t.ratio < t.limit : t.ratio <= t.limit;
}

/** The ratio with three significant digits (0.0853, 1.00, 26.6, 112). */
export function ratioText(r: number): string {
  return r >= 100 ? r.toFixed(0) : r.toPrecision(3);
}

/** The limit as the issue words it: "at most 3", "under 10". */
export function limitText(t: TargetResult): string {
  return `${t.below ? "under" : "at most"} ${t.limit}`;
}

/** The one line a bench prints for a target: `target NAME: MEASURED; ratio R X (at most L) PASS`. */
export function targetLine(t: TargetResult): string {
  return `target ${t.target}: ${t.measured}; ratio ${ratioText(t.ratio)} ${t.ratioOf} (${limitText(t)}) ${passes(t) ? "PASS" : "MISS"}`;
}

/** Where a bench's targets are also written, one JSON line each (set by the targets bench for its parts). */
export const TARGETS_FILE_ENV = "BENCH_TARGETS_FILE";

/** Prints a target's line and, under the targets bench, records it for its table. */
export function reportTarget(t: TargetResult): void {
  console.log(targetLine(t));
  const file = process.env[TARGETS_FILE_ENV];
  if (file) fs.appendFileSync(file, `${JSON.stringify(t)}\n`);
}
