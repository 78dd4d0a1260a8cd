/**
 * Worksheet-function benchmarks of the production build (reported, never asserted). Runs
 * dist/functions.js (build it first: `npx webpack --mode production`), loaded with a
 * stand-in CustomFunctions (measure.ts loadBundle), so the code measured is the code users run.
 *
 * 1. Parametric study: 20,000 distinct 3-span members, each with a UDL and a point load,
 *    one SPAN.MAXMOMENT call per row, the member given (a) as single text cells, as in a
 *    schedule row, and (b) as ranges. Target: at most 15 microseconds per row (CPU time).
 *    Issue 15's stricter target, against a lean yardstick, is row.bench.ts's, which also shows
 *    where a row's time goes.
 * 2. Sweep: 1,000 x-cells of one member as 1,000 separate SPAN.MOMENT calls (fresh argument
 *    arrays per call, as the host passes them) against one 1,000-point SPAN.DIAGRAM, each of a
 *    member the member cache has not seen (a fresh UDL per repetition), so both solve once.
 *    Timed in wall time (a member's sweep is under a millisecond) over windows of WINDOW
 *    members, the two interleaved; the ratio is the median of the windows' ratios. Target: the
 *    sweep at most 3 times the diagram. The same sweep with EI and a units label is timed in
 *    the same windows (each call reads its units argument, so a label costs every cached call).
 *
 * Invented data from a seeded generator; every pass uses members not seen before, so the
 * study never hits the member cache.
 */
import { performance } from "perf_hooks";
import { cpuMs, loadAverage, loadBundle, median, rangeText } from "./measure";

type Fn = (...args: unknown[]) => unknown[][];

const ROWS = 20000;
const PASSES = 5;
const SWEEP = 1000;
/** Members swept (and drawn) in one window; the windows' ratios give the median. */
const WINDOW = 10;
const WINDOWS = 21;
/** The units label of the labelled sweep: every call reads it, cached members included. */
const UNITS = "length=ft, force=kip, EI=kip*in^2, deflection=in";

function random(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 4294967296;
  };
}

const round = (v: number, digits = 2) => Math.round(v * 10 ** digits) / 10 ** digits;

interface Row {
  spans: number[];
  udl: number;
  point: number;
  at: number;
}

function schedule(seed: number, count: number): Row[] {
  const next = random(seed);
  const rows: Row[] = [];
  for (let i = 0; i < count; i++) {
    const spans = [round(3 + 5 * next()), round(3 + 5 * next()), round(3 + 5 * next())];
    const length = spans[0] + spans[1] + spans[2];
    rows.push({ spans, udl: round(0.5 + 4 * next()), point: round(2 + 20 * next()), at: round(length * next()) });
  }
  return rows;
}

type Args = [any[][], any[][], any, any, any];

function asText(row: Row): Args {
  return [[[row.spans.join(" ")]], [[`udl ${row.udl} D; point ${row.point} at ${row.at} L`]], null, null, null];
}

function asRanges(row: Row): Args {
  return [
    [row.spans.slice()],
    [
      ["udl", row.udl, "", "", "", "D"],
      ["point", row.point, row.at, "", "", "L"],
    ],
    null,
    null,
    null,
  ];
}

/** CPU time of `body` in milliseconds. */
function timed(body: () => void): number {
  const cpu = cpuMs();
  body();
  return cpuMs() - cpu;
}

function study(maxMoment: Fn, label: string, form: (row: Row) => Args): void {
  const cpu: number[] = [];
  let checksum = 0;
  for (let pass = 0; pass <= PASSES; pass++) {
    const calls = schedule(1000 + pass * 7919 + label.length, ROWS).map(form);
    const ms = timed(() => {
      for (const args of calls) checksum += maxMoment(...args)[0][0] as number;
    });
    const perRow = (ms * 1000) / ROWS;
    if (pass === 0) {
      console.log(`  ${label}: first pass (with JIT warm-up) ${perRow.toFixed(2)} us/row CPU`);
      continue;
    }
    cpu.push(perRow);
  }
  const perRow = median(cpu);
  console.log(
    `  ${label}: ${perRow.toFixed(2)} us/row CPU (median of ${PASSES} passes of ${ROWS} distinct members) - ${perRow <= 15 ? "within" : "OVER"} the 15 us target [checksum ${checksum.toExponential(6)}]`,
  );
}

function sweep(fx: Record<string, Fn>): void {
  const base: Row = { spans: [5.5, 7.25, 6], udl: 3.2, point: 14, at: 9.1 };
  const length = base.spans[0] + base.spans[1] + base.spans[2];
  let fresh = 0;
  // A member the cache has not seen: the UDL changes in its last digits on every repetition.
  const next = (): Row => ({ ...base, udl: base.udl + ++fresh * 1e-6 });
  // Each member's calls are built just before they are timed (one member's arguments on the heap
  // at a time: holding a window's worth made collection land in the timed loops and the windows'
  // ratios spread over 0.3-36), and timed in wall time (one member's sweep is under a millisecond,
  // finer than the process CPU clock resolves reliably).
  const sweepWindow = (units: string | null = null): number => {
    let ms = 0;
    let sum = 0;
    for (let k = 0; k < WINDOW; k++) {
      const row = next();
      const calls = Array.from({ length: SWEEP }, (_, i) => {
        const [spans, loads] = asRanges(row);
        return [spans, loads, [[(length * i) / (SWEEP - 1)]], null, units === null ? null : [[30000]], null, units === null ? null : [[units]]];
      });
      const start = performance.now();
      for (const args of calls) sum += fx.MOMENT(...args)[0][0] as number;
      ms += performance.now() - start;
    }
    if (!Number.isFinite(sum)) throw new Error("the sweep produced no results");
    return ms / WINDOW;
  };
  const diagramWindow = (): number => {
    let ms = 0;
    let rows = 0;
    for (let k = 0; k < WINDOW; k++) {
      const [spans, loads] = asRanges(next());
      const start = performance.now();
      rows += fx.DIAGRAM(spans, loads, SWEEP, null, null, null).length;
      ms += performance.now() - start;
    }
    if (rows < WINDOW * SWEEP) throw new Error("the diagram produced no results");
    return ms / WINDOW;
  };
  const sweeps: number[] = [];
  const diagrams: number[] = [];
  const ratios: number[] = [];
  const labelled: number[] = [];
  // The first window of each warms up.
  for (let w = 0; w <= WINDOWS; w++) {
    const sweepMs = sweepWindow();
    const diagramMs = diagramWindow();
    const labelledMs = sweepWindow(UNITS);
    if (w === 0) continue;
    sweeps.push(sweepMs);
    diagrams.push(diagramMs);
    ratios.push(sweepMs / diagramMs);
    labelled.push(labelledMs);
  }
  const ratio = median(ratios);
  console.log(
    `  sweep: ${SWEEP} separate MOMENT calls ${median(sweeps).toFixed(3)} ms wall, one ${SWEEP}-point DIAGRAM ${median(diagrams).toFixed(3)} ms wall ` +
      `(medians of ${WINDOWS} interleaved windows of ${WINDOW}; windows' ratios ${rangeText(ratios, 2)}); ` +
      `ratio ${ratio.toFixed(2)} (median of the windows') - ${ratio <= 3 ? "within" : "OVER"} the 3x target`,
  );
  console.log(`  the same sweep with EI and a units label ("${UNITS}"): ${median(labelled).toFixed(3)} ms wall, ${(median(labelled) / median(sweeps)).toFixed(2)} x the sweep without (same windows)`);
}

export function run(): void {
  const fx = loadBundle() as Record<string, Fn>;
  console.log(`load average ${loadAverage(1)} on the machine's cores (other work on the machine inflates the times); dist/functions.js`);
  console.log("parametric study, SPAN.MAXMOMENT once per row, 3 spans, UDL + point load:");
  study(fx.MAXMOMENT, "text cells", asText);
  study(fx.MAXMOMENT, "ranges", asRanges);
  console.log("x sweep on one member (the member cache at work):");
  sweep(fx);
  console.log(`load average after: ${loadAverage(1)}`);
}
