/**
 * Every worksheet function at its documented limits (reported, never asserted):
 * `node tests/bench/run.js limits`.
 *
 * Calls go through the production bundle (webpack production build of functions.js, minified
 * without name-keeping, loaded with a stand-in CustomFunctions.associate), as the host runs
 * it (../shared/TOOLCHAIN.md). Members carry the loads limit (10,000 loads) and, where a
 * function takes a member, the spans limit (10,000 spans); the studies are walked to the
 * limits of src/core/limits.ts: their counts and their size budgets (the largest call each
 * budget lets through). Every repetition uses a member not seen before, so the member cache
 * never answers. Each scenario prints the wall time and the process CPU time of its slowest
 * repetition; each function its worst scenario against the 200 ms target. The machine is
 * shared, so the load average is printed beside the numbers.
 */
import * as os from "os";
import * as path from "path";
import { performance } from "perf_hooks";
import { LIMITS, WORK_LIMIT, workOf, type StudyCounts, type StudyKind } from "../../src/core";
import { buildAddin } from "../functions/build";

type Fn = (...args: any[]) => any;
const REPS = Number(process.env.LIMITS_REPS ?? 3);
const TARGET_MS = 200;
const MAX_LOADS = 10000;
const MAX_SPANS = 10000;

function loadBundle(dir: string): Record<string, Fn> {
  const fns: Record<string, Fn> = {};
  const g = globalThis as { CustomFunctions?: unknown };
  const previous = g.CustomFunctions;
  g.CustomFunctions = { associate: (name: string, fn: Fn) => (fns[name] = fn) };
  try {
    require(path.join(dir, "functions.js"));
  } finally {
    g.CustomFunctions = previous;
  }
  return fns;
}

let fresh = 0;
/** Span lengths with a first span that differs by a hair on every call (no cache hits). */
function spans(count: number, length = 5): number[][] {
  fresh++;
  return [Array.from({ length: count }, (_, i) => (i === 0 ? length + fresh * 1e-7 : length))];
}

const CASES = ["D", "L", "S", "W"];
/** `count` point loads spread over the member, cases D, L, S, W by turns. */
function loads(count: number, memberLength: number, cases = CASES): unknown[][] {
  const rows: unknown[][] = [];
  for (let i = 0; i < count; i++) rows.push(["point", 1 + (i % 7), (memberLength * (i + 0.37)) / count, "", "", cases[i % cases.length]]);
  return rows;
}

function column(count: number, value: (i: number) => unknown): unknown[][] {
  return Array.from({ length: count }, (_, i) => [value(i)]);
}

function combinations(count: number): unknown[][] {
  return column(count, (i) => `${(1.0 + i / 200).toFixed(3)}D + ${(1.6 - i / 400).toFixed(4)}L + 0.5S + ${(i % 3) * 0.5}W`);
}

interface Scenario {
  fn: string;
  what: string;
  call: (f: Record<string, Fn>) => unknown;
  /** The study's size against its budget, when it has one. */
  size?: [number, number];
}

const big = { spans: MAX_SPANS, length: 5 * MAX_SPANS };
const memberAtLimits = () => [spans(big.spans), loads(MAX_LOADS, big.length)] as const;
const EI = [[30000]];

function study(kind: StudyKind, counts: Partial<StudyCounts>): [number, number] {
  const full: StudyCounts = { spans: 1, loads: 0, cases: 0, pattern: "none", combinations: 0, positions: 0, axles: 0, ...counts };
  return [workOf(kind, full), WORK_LIMIT];
}

/** The largest count n for which size(n) stays within the budget. */
function largest(size: (n: number) => number, budget: number, cap: number): number {
  let lo = 1;
  let hi = cap;
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    if (size(mid) <= budget) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

function scenarios(): Scenario[] {
  const out: Scenario[] = [];
  const memberFns: [string, (f: Record<string, Fn>, s: unknown, l: unknown) => unknown][] = [
    ["REACTIONS", (f, s, l) => f.REACTIONS(s, l, null, EI, "1.2D+1.6L+0.5S", null)],
    ["MAXMOMENT", (f, s, l) => f.MAXMOMENT(s, l, null, EI, "1.2D+1.6L", null)],
    ["EXTREMES", (f, s, l) => f.EXTREMES(s, l, null, EI, "1.2D+1.6L", null)],
    ["DIAGRAM", (f, s, l) => f.DIAGRAM(s, l, 10001, null, EI, "1.2D+1.6L", null)],
    ["STRESS", (f, s, l) => f.STRESS(s, l, [[250, 260]], null, EI, "1.2D+1.6L", null)],
    ["SHEARSTRESS", (f, s, l) => f.SHEARSTRESS(s, l, [[0.015, 2.8e-5, 2.8e-4, 0.1]], null, EI, "1.2D+1.6L", null)],
    ["DEFLECTIONCHECK", (f, s, l) => f.DEFLECTIONCHECK(s, l, "L/360", null, EI, "D+L", null)],
  ];
  for (const [fn, call] of memberFns) {
    out.push({ fn, what: `${MAX_SPANS} spans, ${MAX_LOADS} loads`, call: (f) => call(f, ...memberAtLimits()) });
    out.push({ fn, what: `12 spans, ${MAX_LOADS} loads`, call: (f) => call(f, spans(12), loads(MAX_LOADS, 60)) });
  }
  out.push({
    fn: "REACTIONS",
    what: `${MAX_SPANS} spans, ${MAX_LOADS} loads, units`,
    call: (f) => f.REACTIONS(...memberAtLimits(), null, [[4e6]], "1.2D+1.6L", "length=ft, force=kip, EI=kip*in^2"),
  });
  const xs = column(LIMITS.positions, (i) => (big.length * i) / (LIMITS.positions - 1));
  for (const fn of ["SHEAR", "MOMENT", "SLOPE", "DEFLECTION"]) {
    out.push({ fn, what: `${MAX_SPANS} spans, ${MAX_LOADS} loads, ${LIMITS.positions} x cells`, call: (f) => f[fn](...memberAtLimits(), xs, null, EI, "1.2D+1.6L", null) });
  }

  // ENVELOPE: the largest calls the size limit lets through, one count pushed to its limit at a time.
  {
    const X = LIMITS.positions;
    const text4 = [["udl 2 D; udl 3 L; udl 1 S; udl 0.5 W"]];
    const x12 = column(X, (i) => (60 * i) / (X - 1));
    const c = largest((k) => study("ENVELOPE", { spans: 12, loads: 4, cases: 4, pattern: "full", combinations: k, positions: X })[0], WORK_LIMIT, LIMITS.combinations);
    out.push({ fn: "ENVELOPE", what: `12 spans, 4 loads, full L, ${c} combinations, ${X} x cells`, size: study("ENVELOPE", { spans: 12, loads: 4, cases: 4, pattern: "full", combinations: c, positions: X }), call: (f) => f.ENVELOPE(spans(12), text4, x12, combinations(c), null, EI, "moment", "full L", null) });
    const cs = largest((k) => study("ENVELOPE", { spans: 12, loads: 4, cases: 4, pattern: "standard", combinations: k, positions: X })[0], WORK_LIMIT, LIMITS.combinations);
    out.push({ fn: "ENVELOPE", what: `12 spans, 4 loads, standard L, ${cs} combinations, ${X} x cells`, size: study("ENVELOPE", { spans: 12, loads: 4, cases: 4, pattern: "standard", combinations: cs, positions: X }), call: (f) => f.ENVELOPE(spans(12), text4, x12, combinations(cs), null, EI, "moment", "standard L", null) });
    const L = largest((n) => study("ENVELOPE", { spans: 12, loads: n, cases: 4, pattern: "full", combinations: 14, positions: 1001 })[0], WORK_LIMIT, MAX_LOADS);
    out.push({ fn: "ENVELOPE", what: `12 spans, ${L} loads, full L, 14 combinations, 1001 x cells`, size: study("ENVELOPE", { spans: 12, loads: L, cases: 4, pattern: "full", combinations: 14, positions: 1001 }), call: (f) => f.ENVELOPE(spans(12), loads(L, 60), column(1001, (i) => (60 * i) / 1000), [["ASCE7-2.3.1"]], null, EI, "moment", "full L", null) });
    const two = { spans: MAX_SPANS, loads: MAX_LOADS, cases: 2, combinations: 1 };
    const X2 = largest((k) => study("ENVELOPE", { ...two, positions: k })[0], WORK_LIMIT, X);
    out.push({ fn: "ENVELOPE", what: `${MAX_SPANS} spans, ${MAX_LOADS} loads (D, L), 1 combination, ${X2} x cells`, size: study("ENVELOPE", { ...two, positions: X2 }), call: (f) => f.ENVELOPE(spans(MAX_SPANS), loads(MAX_LOADS, big.length, ["D", "L"]), column(X2, (i) => (big.length * i) / Math.max(1, X2 - 1)), [["1.2D+1.6L"]], null, EI, "moment", null, null) });
  }

  // PEAKS: the issue 15 case (full pattern on 12 spans, the ASCE strength set), then the size limit.
  {
    const C = LIMITS.combinations;
    out.push({ fn: "PEAKS", what: "12 spans, 4 loads, full L, ASCE7-2.3.1 (14 combinations)", size: study("PEAKS", { spans: 12, loads: 4, cases: 4, pattern: "full", combinations: 14 }), call: (f) => f.PEAKS(spans(12), [["udl 2 D; udl 3 L; udl 1 S; udl 0.5 W"]], [["ASCE7-2.3.1"]], null, EI, "full L", null) });
    for (const pattern of ["full", "standard", "none"] as const) {
      const L = largest((n) => study("PEAKS", { spans: 12, loads: n, cases: 4, pattern, combinations: C })[0], WORK_LIMIT, MAX_LOADS);
      out.push({ fn: "PEAKS", what: `12 spans, ${L} loads, ${pattern} L, ${C} combinations`, size: study("PEAKS", { spans: 12, loads: L, cases: 4, pattern, combinations: C }), call: (f) => f.PEAKS(spans(12), loads(L, 60), combinations(C), null, EI, `${pattern} L`, null) });
    }
    const one = { spans: MAX_SPANS, loads: MAX_LOADS, cases: 1 };
    const c2 = largest((k) => study("PEAKS", { ...one, combinations: k })[0], WORK_LIMIT, C);
    out.push({ fn: "PEAKS", what: `${MAX_SPANS} spans, ${MAX_LOADS} loads (D), ${c2} combinations`, size: study("PEAKS", { ...one, combinations: c2 }), call: (f) => f.PEAKS(spans(MAX_SPANS), loads(MAX_LOADS, big.length, ["D"]), column(c2, (i) => `${1 + i / 10}D`), null, EI, null, null) });
  }

  // INFLUENCE: positions x (spans + 1) within its budget.
  for (const n of [1, 12, 1000, MAX_SPANS]) {
    const P = largest((k) => study("INFLUENCE", { spans: n, positions: k })[0], WORK_LIMIT, LIMITS.positions);
    out.push({ fn: "INFLUENCE", what: `${n} spans, ${P} positions`, size: study("INFLUENCE", { spans: n, positions: P }), call: (f) => f.INFLUENCE(spans(n), "moment at 2.5", column(P, (i) => (5 * n * i) / Math.max(1, P - 1)), null, EI) });
  }

  // MOVING: axles within their limit and the budget.
  for (const n of [1, 12, 40]) {
    for (const effect of ["absolute moment", "moment at 2.5", "reaction 1"]) {
      const absoluteMoment = effect === "absolute moment";
      if (study("MOVING", { spans: n, axles: 1, absoluteMoment })[0] > WORK_LIMIT) continue;
      const a = largest((k) => study("MOVING", { spans: n, axles: k, absoluteMoment })[0], WORK_LIMIT, LIMITS.axles);
      out.push({ fn: "MOVING", what: `${n} spans, ${a} axles, ${effect}`, size: study("MOVING", { spans: n, axles: a, absoluteMoment }), call: (f) => f.MOVING(spans(n), [Array(a).fill(10)], [Array(a - 1).fill(0.3)], effect, null, EI) });
    }
  }

  const v = LIMITS.variableCases;
  const labels = Array.from({ length: v }, (_, i) => `Q${i}`);
  out.push({ fn: "COMBOS", what: `EN1990-6.10, ${v} variable cases, ${LIMITS.psi0Pairs} psi0 pairs`, call: () => 0 });
  out[out.length - 1].call = (f) => f.COMBOS("EN1990-6.10", labels.map((l) => `${l} 0.${(fresh++ % 9) + 1}`).join(", "), [labels]);
  out.push({ fn: "COMBOS", what: "ASCE7-2.3.1", call: (f) => f.COMBOS("ASCE7-2.3.1", null, null) });

  out.push({ fn: "SECTION", what: "I section, units", call: (f) => f.SECTION("I", [[400 + (fresh++ % 10), 180, 13.5, 8.6]], "mm", "in") });
  out.push({ fn: "SECTION", what: "tee section", call: (f) => f.SECTION("tee", [[300, 200 + (fresh++ % 10), 15, 10]], null, null) });
  const cells = LIMITS.positions;
  out.push({ fn: "UTILISATION", what: `${cells} demand cells, one capacity each, units`, call: (f) => f.UTILISATION(column(cells, (i) => i + fresh), column(cells, (i) => 2 * i + 1), "kip*ft", "kN*m") });
  out.push({ fn: "CONVERT", what: `${cells} cells`, call: (f) => f.CONVERT(column(cells, (i) => i + fresh), "kip/ft", "kN/m") });
  out.push({ fn: "STIFFNESS", what: `${cells} cells (E per span, one I)`, call: (f) => f.STIFFNESS(column(cells, (i) => 29000 + i + fresh), [[510]], "ksi", "in^4", "kip*ft^2") });
  return out;
}

function outcome(value: unknown): string {
  if (Array.isArray(value)) return `${value.length} rows`;
  return String(value).slice(0, 60);
}

export async function run(): Promise<void> {
  const dir = await buildAddin();
  const fns = loadBundle(dir);
  const names = Object.keys(fns);
  console.log(`production bundle ${path.join(dir, "functions.js")} (${names.length} functions)`);
  const before = os.loadavg();
  console.log(`load average ${before.map((l) => l.toFixed(1)).join(" ")} on ${os.cpus().length} cores (other work inflates wall times; CPU time is this process's own)`);
  const worst = new Map<string, { wall: number; cpu: number; what: string }>();
  for (const s of scenarios()) {
    let wall = 0;
    let cpu = 0;
    let result: unknown;
    for (let rep = 0; rep < REPS; rep++) {
      const c0 = process.cpuUsage();
      const t0 = performance.now();
      try {
        result = s.call(fns);
      } catch (error) {
        result = `ERROR ${(error as { message?: string }).message}`;
      }
      const w = performance.now() - t0;
      const c = process.cpuUsage(c0);
      // The first repetition warms the JIT; the slowest of the others is reported.
      if (rep === 0 && REPS > 1) continue;
      wall = Math.max(wall, w);
      cpu = Math.max(cpu, (c.user + c.system) / 1000);
    }
    const size = s.size ? `  size ${s.size[0]} of ${s.size[1]}` : "";
    console.log(`  ${s.fn.padEnd(15)} ${s.what.padEnd(58)} wall ${wall.toFixed(1).padStart(7)} ms  CPU ${cpu.toFixed(1).padStart(7)} ms  ${outcome(result)}${size}`);
    const w = worst.get(s.fn);
    if (!w || cpu > w.cpu) worst.set(s.fn, { wall, cpu, what: s.what });
  }
  console.log(`\nworst per function (CPU of the slowest repetition; target ${TARGET_MS} ms):`);
  for (const name of names) {
    const w = worst.get(name);
    if (!w) {
      console.log(`  ${name.padEnd(15)} NOT MEASURED`);
      continue;
    }
    const verdict = w.cpu <= TARGET_MS ? "within" : "OVER";
    console.log(`  ${name.padEnd(15)} ${w.cpu.toFixed(1).padStart(7)} ms CPU (${w.wall.toFixed(1)} ms wall)  ${verdict}  [${w.what}]`);
  }
  console.log(`load average after ${os.loadavg().map((l) => l.toFixed(1)).join(" ")}`);
}
