/**
 * Worksheet-function benchmarks (reported, never asserted):
 *
 * 1. Parametric study: 20,000 distinct 3-span members, each with a UDL and a point load,
 *    one SPAN.MAXMOMENT call per row, the member given (a) as single text cells, as in a
 *    schedule row, and (b) as ranges. Target: at most 15 microseconds per row.
 * 2. Sweep: 1,000 x-cells of one member as 1,000 separate SPAN.MOMENT calls (fresh argument
 *    arrays per call, as the host passes them) against one 1,000-point SPAN.DIAGRAM, both
 *    from a cold cache. Target: the sweep at most 3 times the diagram.
 *
 * Invented data from a seeded generator; every pass uses members not seen before, so the
 * study never hits the member cache.
 */
import * as os from "os";
import { performance } from "perf_hooks";
import * as fx from "../../functions/functions";
import { extremes, solve } from "../../src/core";
import { memberHash, readMember, solvedMembers } from "../../src/sheet";
import { median } from "./measure";

const ROWS = 20000;
const PASSES = 5;
const SWEEP = 1000;

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

/** Wall-clock and process CPU time of `body`, in milliseconds. */
function timed(body: () => void): { wall: number; cpu: number } {
  const cpu0 = process.cpuUsage();
  const wall0 = performance.now();
  body();
  const wall = performance.now() - wall0;
  const cpu = process.cpuUsage(cpu0);
  return { wall, cpu: (cpu.user + cpu.system) / 1000 };
}

function study(label: string, form: (row: Row) => Args): void {
  const wall: number[] = [];
  const cpu: number[] = [];
  let checksum = 0;
  for (let pass = 0; pass <= PASSES; pass++) {
    const calls = schedule(1000 + pass * 7919 + label.length, ROWS).map(form);
    const t = timed(() => {
      for (const args of calls) checksum += fx.maxMoment(...args)[0][0];
    });
    const perRow = (ms: number) => (ms * 1000) / ROWS;
    if (pass === 0) {
      console.log(`  ${label}: first pass (with JIT warm-up) ${perRow(t.wall).toFixed(2)} us/row wall`);
      continue;
    }
    wall.push(perRow(t.wall));
    cpu.push(perRow(t.cpu));
  }
  const best = Math.min(...wall);
  console.log(
    `  ${label}: ${median(wall).toFixed(2)} us/row wall (median of ${PASSES} passes of ${ROWS} distinct members; best ${best.toFixed(2)}), ` +
      `${median(cpu).toFixed(2)} us/row CPU - ${best <= 15 ? "within" : "OVER"} the 15 us target [checksum ${checksum.toExponential(6)}]`,
  );
}

/** Where a row's time goes: key, cell reading, solve, extremes (text-cell form). */
function breakdown(): void {
  const calls = schedule(424242, ROWS).map(asText);
  const args = calls.map(([spans, loads, supports, EI, combo]) => ({ spans, loads, supports, EI, combo }));
  for (let rep = 0; rep < 2; rep++) {
    let members: ReturnType<typeof readMember>[] = [];
    let solutions: ReturnType<typeof solve>[] = [];
    const key = timed(() => args.forEach((a) => memberHash(a)));
    const read = timed(() => (members = args.map((a) => readMember(a))));
    const solved = timed(() => (solutions = members.map((m) => solve(m))));
    const peaks = timed(() => solutions.forEach((s) => extremes(s, "moment")));
    if (rep === 1) {
      const us = (t: { wall: number }) => ((t.wall * 1000) / ROWS).toFixed(2);
      console.log(`  breakdown per row (text cells, wall): key ${us(key)} us, reading cells ${us(read)} us, core solve ${us(solved)} us, core extremes ${us(peaks)} us`);
    }
  }
}

function sweep(): void {
  const row: Row = { spans: [5.5, 7.25, 6], udl: 3.2, point: 14, at: 9.1 };
  const length = row.spans[0] + row.spans[1] + row.spans[2];
  const ratios: number[] = [];
  const sweeps: number[] = [];
  const diagrams: number[] = [];
  for (let rep = 0; rep < 22; rep++) {
    const sweepCalls = Array.from({ length: SWEEP }, (_, i) => {
      const [spans, loads] = asRanges(row);
      return [spans, loads, [[(length * i) / (SWEEP - 1)]], null, null, null] as const;
    });
    const [spans, loads] = asRanges(row);
    solvedMembers.clear();
    let start = performance.now();
    let sum = 0;
    for (const args of sweepCalls) sum += fx.moment(...(args as unknown as [any[][], any[][], any[][], any, any, any]))[0][0];
    const sweepMs = performance.now() - start;
    solvedMembers.clear();
    start = performance.now();
    const table = fx.diagram(spans, loads, SWEEP, null as any, null as any, null);
    const diagramMs = performance.now() - start;
    if (!Number.isFinite(sum) || table.length < SWEEP) throw new Error("benchmark produced no results");
    if (rep >= 2) {
      sweeps.push(sweepMs);
      diagrams.push(diagramMs);
      ratios.push(sweepMs / diagramMs);
    }
  }
  const best = Math.min(...sweeps) / Math.min(...diagrams);
  console.log(
    `  sweep: ${SWEEP} separate MOMENT calls ${median(sweeps).toFixed(3)} ms (best ${Math.min(...sweeps).toFixed(3)}), ` +
      `one ${SWEEP}-point DIAGRAM ${median(diagrams).toFixed(3)} ms (best ${Math.min(...diagrams).toFixed(3)}); ` +
      `ratio of bests ${best.toFixed(2)}, median ratio ${median(ratios).toFixed(2)} - ${best <= 3 ? "within" : "OVER"} the 3x target`,
  );
}

export function run(): void {
  console.log(`load average ${os.loadavg().map((l) => l.toFixed(1)).join(" ")} on ${os.cpus().length} cores (other work on the machine inflates wall times)`);
  console.log("parametric study, SPAN.MAXMOMENT once per row, 3 spans, UDL + point load:");
  study("text cells", asText);
  study("ranges", asRanges);
  breakdown();
  console.log("x sweep on one member (the member cache at work):");
  sweep();
}
