/**
 * Every worksheet function at its documented limits (reported, never asserted):
 * `npm run bench -- limits` (LIMITS_ONLY=DIAGRAM,REACTIONS for some functions,
 * LIMITS_REPS=n repetitions, the first of them a warm-up).
 *
 * Calls go through the production bundle (webpack production build of functions.js, minified
 * without name-keeping, loaded with a stand-in CustomFunctions.associate), as the host runs
 * it (../shared/TOOLCHAIN.md). Members carry the loads limit (MAX_LOADS) and, where a
 * function takes a member, the spans limit (MAX_SPANS); the studies are walked to the
 * limits of src/core/limits.ts: their counts and their size budgets (the largest call each
 * budget lets through); the vibration functions to their work limit (elements x modes) and
 * their x-cell limit. Every repetition uses a member not seen before, so the member cache
 * never answers, and its arguments are built before the clock starts (the host hands them
 * over ready; building 10,000 load rows inside the timing would add their garbage to the call).
 * Garbage left by the previous repetition is collected before each one, so a repetition pays
 * for collecting only what it allocates itself.
 *
 * Each scenario prints the process CPU time of its repetitions after the warm-up (median and
 * slowest) and the slowest wall time; each function its worst scenario (by median) against the
 * 200 ms target: PASS when the median and the slowest are within it, else MISS. The machine is shared, so the load average is printed beside the numbers.
 * Issue 15's arrangements case (PEAKS, full pattern on 12 spans, 14 combinations) also prints
 * its target line, at most 20 ms per combination (`arrangementsScenario`, used by targets.bench.ts).
 */
import * as os from "os";
import * as path from "path";
import { performance } from "perf_hooks";
import * as v8 from "v8";
import * as vm from "vm";
import { LIMITS, MAX_LOADS, MAX_CASES, MAX_MODES, MAX_VIBRATION_ELEMENTS, MAX_VIBRATION_WORK, WORK_LIMIT, workOf, type StudyCounts, type StudyKind } from "../../src/core";
import { MAX_SPANS } from "../../src/sheet/lists";
import { buildAddin } from "../functions/build";
import { loadBundle, median, reportTarget, type TargetResult } from "./measure";

type Fn = (...args: any[]) => any;
const REPS = Number(process.env.LIMITS_REPS ?? 5);
const TARGET_MS = 200;

// Collects garbage on request (the flag is set at run time, since the runner starts node plainly).
v8.setFlagsFromString("--expose-gc");
const gc = vm.runInNewContext("gc") as () => void;
function collectGarbage(): void {
  gc();
}

function maxOf(values: number[]): number {
  let max = -Infinity;
  for (const v of values) if (v > max) max = v;
  return max;
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
  /** Builds one repetition's arguments (outside the timing) and returns the call. */
  make: () => Call;
  /** The study's size against its budget, when it has one. */
  size?: [number, number];
  /** Issue 15's target this scenario measures, from its timing. */
  target?: (t: ScenarioTiming) => TargetResult;
}

type Call = (f: Record<string, Fn>) => unknown;

/** The call of worksheet function `name` on arguments built now. */
function bind(name: string, args: unknown[]): Call {
  return (f) => f[name](...args);
}

function withMember(call: (f: Record<string, Fn>, s: unknown, l: unknown) => unknown, s: unknown, l: unknown): Call {
  return (f) => call(f, s, l);
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

/** Issue 15's arrangements case: SPAN.PEAKS, pattern full on 12 spans, a UDL in each of 4 cases, the ASCE strength set. */
const ARRANGEMENTS = { spans: 12, loads: 4, cases: 4, pattern: "full", combinations: 14 } as const;
/** Issue 15's arrangements target: at most 20 ms per combination (the full search was 0.3 s). */
const ARRANGEMENT_MS = 20;

export function arrangementsScenario(): Scenario {
  const n = ARRANGEMENTS.combinations;
  return {
    fn: "PEAKS",
    what: `12 spans, 4 loads, full L, ASCE7-2.3.1 (${n} combinations)`,
    size: study("PEAKS", ARRANGEMENTS),
    make: () => bind("PEAKS", [spans(ARRANGEMENTS.spans), [["udl 2 D; udl 3 L; udl 1 S; udl 0.5 W"]], [["ASCE7-2.3.1"]], null, EI, "full L", null]),
    target: (t) => {
      const each = t.median / n;
      return { target: "arrangements", measured: `SPAN.PEAKS, full pattern on 12 spans, ${n} combinations: ${t.median.toFixed(1)} ms CPU (median of ${t.reps}; wall up to ${t.wall.toFixed(1)} ms) = ${each.toFixed(2)} ms per combination`, ratio: each / ARRANGEMENT_MS, ratioOf: `of ${ARRANGEMENT_MS} ms per combination`, limit: 1 };
    },
  };
}

export interface ScenarioTiming {
  /** Process CPU ms of the repetitions after the warm-up: median and slowest; the slowest wall ms. */
  median: number;
  worst: number;
  wall: number;
  reps: number;
  /** The last repetition's answer. */
  result: unknown;
}

/** Runs a scenario `reps` times (the first a warm-up, when there are several), each on arguments built before the clock and after a collection. */
export function timeScenario(s: Scenario, fns: Record<string, Fn>, reps = REPS): ScenarioTiming {
  const cpus: number[] = [];
  const walls: number[] = [];
  let result: unknown;
  for (let rep = 0; rep < reps; rep++) {
    const call = s.make();
    collectGarbage();
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    try {
      result = call(fns);
    } catch (error) {
      result = `ERROR ${(error as { message?: string }).message}`;
    }
    const w = performance.now() - t0;
    const c = process.cpuUsage(c0);
    // The first repetition warms the JIT; the others are reported.
    if (rep === 0 && reps > 1) continue;
    cpus.push((c.user + c.system) / 1000);
    walls.push(w);
  }
  return { median: median(cpus), worst: maxOf(cpus), wall: maxOf(walls), reps: cpus.length, result };
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
    ["SPANPEAKS", (f, s, l) => f.SPANPEAKS(s, l, null, EI, "1.2D+1.6L", null, null)],
  ];
  for (const [fn, call] of memberFns) {
    out.push({ fn, what: `${MAX_SPANS} spans, ${MAX_LOADS} loads`, make: () => withMember(call, ...memberAtLimits()) });
    out.push({ fn, what: `12 spans, ${MAX_LOADS} loads`, make: () => withMember(call, spans(12), loads(MAX_LOADS, 60)) });
  }
  // CASEREACTIONS: a solve per case label (at most MAX_CASES) and the combination's, within the size limit.
  {
    const labels = (k: number) => Array.from({ length: k }, (_, i) => `C${i}`);
    const allOf = (k: number) => labels(k).join("+");
    const perCase = (k: number) => labels(k).map((c, i) => ["udl", 1 + i, "", "", "", c]);
    const cr = (counts: Partial<StudyCounts>) => study("CASEREACTIONS", counts);
    const k = largest((n) => cr({ spans: MAX_SPANS, loads: n, cases: n })[0], WORK_LIMIT, MAX_CASES);
    out.push({ fn: "CASEREACTIONS", what: `${MAX_SPANS} spans, ${k} case labels (a udl each)`, size: cr({ spans: MAX_SPANS, loads: k, cases: k }), make: () => bind("CASEREACTIONS", [spans(MAX_SPANS), perCase(k), null, EI, null, null, null, null]) });
    out.push({ fn: "CASEREACTIONS", what: `${MAX_SPANS} spans, ${MAX_LOADS} loads, 1 case label`, size: cr({ spans: MAX_SPANS, loads: MAX_LOADS, cases: 1 }), make: () => bind("CASEREACTIONS", [spans(MAX_SPANS), loads(MAX_LOADS, big.length, ["D"]), null, EI, null, null, null, null]) });
    const L = largest((n) => cr({ spans: MAX_SPANS, loads: n, cases: 1, combinations: 1 })[0], WORK_LIMIT, MAX_LOADS);
    out.push({ fn: "CASEREACTIONS", what: `${MAX_SPANS} spans, ${L} loads, 1 case label, combination`, size: cr({ spans: MAX_SPANS, loads: L, cases: 1, combinations: 1 }), make: () => bind("CASEREACTIONS", [spans(MAX_SPANS), loads(L, big.length, ["D"]), null, EI, "1.4D", null, null, null]) });
    const L12 = largest((m) => cr({ spans: 12, loads: m, cases: MAX_CASES, combinations: 1 })[0], WORK_LIMIT, MAX_LOADS);
    out.push({ fn: "CASEREACTIONS", what: `12 spans, ${L12} loads, ${MAX_CASES} case labels, combination`, size: cr({ spans: 12, loads: L12, cases: MAX_CASES, combinations: 1 }), make: () => bind("CASEREACTIONS", [spans(12), loads(L12, 60, labels(MAX_CASES)), null, EI, allOf(MAX_CASES), null, null, null]) });
    const n = largest((m) => cr({ spans: m, loads: MAX_CASES, cases: MAX_CASES, combinations: 1 })[0], WORK_LIMIT, MAX_SPANS);
    out.push({ fn: "CASEREACTIONS", what: `${n} spans, ${MAX_CASES} case labels (a udl each), combination`, size: cr({ spans: n, loads: MAX_CASES, cases: MAX_CASES, combinations: 1 }), make: () => bind("CASEREACTIONS", [spans(n), perCase(MAX_CASES), null, EI, allOf(MAX_CASES), null, null, null]) });
  }

  // FREQUENCIES and MODESHAPE: modes up to 50, elements up to their limit and elements x modes up
  // to the work limit; MODESHAPE mode m takes m + 1 modes (a repeated frequency is refused) and 10,001 x cells.
  const mass = [[0.4]];
  for (const n of [1, 50, 125, MAX_VIBRATION_ELEMENTS]) {
    const modes = Math.min(MAX_MODES, Math.floor(MAX_VIBRATION_WORK / n));
    out.push({ fn: "FREQUENCIES", what: `${n} spans, ${modes} modes`, make: () => bind("FREQUENCIES", [spans(n), EI, mass, modes, null, null, null, null, null, null]) });
    const mode = n === 1 ? MAX_MODES : modes - 1;
    const xm = column(LIMITS.positions, (i) => (5 * n * i) / (LIMITS.positions - 1));
    out.push({ fn: "MODESHAPE", what: `${n} spans, mode ${mode}, ${LIMITS.positions} x cells`, make: () => bind("MODESHAPE", [spans(n), EI, mass, mode, xm, null, null, null, null, null]) });
  }
  const masses = MAX_VIBRATION_ELEMENTS - 1;
  const massModes = MAX_VIBRATION_WORK / MAX_VIBRATION_ELEMENTS;
  out.push({ fn: "FREQUENCIES", what: `1 span, ${masses} point masses from loads, ${massModes} modes`, make: () => bind("FREQUENCIES", [spans(1, 50), EI, mass, massModes, null, loads(masses, 50, ["D"]), "D", null, 9.81, null]) });

  out.push({
    fn: "REACTIONS",
    what: `${MAX_SPANS} spans, ${MAX_LOADS} loads, units`,
    make: () => bind("REACTIONS", [...memberAtLimits(), null, [[4e6]], "1.2D+1.6L", "length=ft, force=kip, EI=kip*in^2"]),
  });
  const xs = column(LIMITS.positions, (i) => (big.length * i) / (LIMITS.positions - 1));
  for (const fn of ["SHEAR", "MOMENT", "SLOPE", "DEFLECTION"]) {
    out.push({ fn, what: `${MAX_SPANS} spans, ${MAX_LOADS} loads, ${LIMITS.positions} x cells`, make: () => bind(fn, [...memberAtLimits(), xs, null, EI, "1.2D+1.6L", null]) });
  }

  // ENVELOPE: the largest calls the size limit lets through, one count pushed to its limit at a time.
  {
    const X = LIMITS.positions;
    const text4 = [["udl 2 D; udl 3 L; udl 1 S; udl 0.5 W"]];
    const X3 = 1001;
    const x12 = column(X3, (i) => (60 * i) / (X3 - 1));
    const c3 = largest((k) => study("ENVELOPE", { spans: 3, loads: 2, cases: 2, combinations: k, positions: X })[0], WORK_LIMIT, LIMITS.combinations);
    out.push({ fn: "ENVELOPE", what: `3 spans, 2 loads, ${X} x cells, ${c3} combinations`, size: study("ENVELOPE", { spans: 3, loads: 2, cases: 2, combinations: c3, positions: X }), make: () => bind("ENVELOPE", [spans(3), [["udl 3 D; udl 4 L"]], column(X, (i) => (15 * i) / (X - 1)), combinations(c3), null, EI, "moment", null, null]) });
    const c = largest((k) => study("ENVELOPE", { spans: 12, loads: 4, cases: 4, pattern: "full", combinations: k, positions: X3 })[0], WORK_LIMIT, LIMITS.combinations);
    out.push({ fn: "ENVELOPE", what: `12 spans, 4 loads, full L, ${c} combinations, ${X3} x cells`, size: study("ENVELOPE", { spans: 12, loads: 4, cases: 4, pattern: "full", combinations: c, positions: X3 }), make: () => bind("ENVELOPE", [spans(12), text4, x12, combinations(c), null, EI, "moment", "full L", null]) });
    const cs = largest((k) => study("ENVELOPE", { spans: 12, loads: 4, cases: 4, pattern: "standard", combinations: k, positions: X3 })[0], WORK_LIMIT, LIMITS.combinations);
    out.push({ fn: "ENVELOPE", what: `12 spans, 4 loads, standard L, ${cs} combinations, ${X3} x cells`, size: study("ENVELOPE", { spans: 12, loads: 4, cases: 4, pattern: "standard", combinations: cs, positions: X3 }), make: () => bind("ENVELOPE", [spans(12), text4, x12, combinations(cs), null, EI, "moment", "standard L", null]) });
    const L = largest((n) => study("ENVELOPE", { spans: 12, loads: n, cases: 4, pattern: "full", combinations: 14, positions: 1001 })[0], WORK_LIMIT, MAX_LOADS);
    out.push({ fn: "ENVELOPE", what: `12 spans, ${L} loads, full L, 14 combinations, 1001 x cells`, size: study("ENVELOPE", { spans: 12, loads: L, cases: 4, pattern: "full", combinations: 14, positions: 1001 }), make: () => bind("ENVELOPE", [spans(12), loads(L, 60), column(1001, (i) => (60 * i) / 1000), [["ASCE7-2.3.1"]], null, EI, "moment", "full L", null]) });
    const two = { spans: MAX_SPANS, cases: 2, combinations: 1, positions: 101 };
    const L2 = largest((k) => study("ENVELOPE", { ...two, loads: k })[0], WORK_LIMIT, MAX_LOADS);
    out.push({ fn: "ENVELOPE", what: `${MAX_SPANS} spans, ${L2} loads (D, L), 1 combination, 101 x cells`, size: study("ENVELOPE", { ...two, loads: L2 }), make: () => bind("ENVELOPE", [spans(MAX_SPANS), loads(L2, big.length, ["D", "L"]), column(101, (i) => (big.length * i) / 100), [["1.2D+1.6L"]], null, EI, "moment", null, null]) });
    const Xf = largest((k) => study("ENVELOPE", { spans: 12, loads: 4, cases: 4, pattern: "full", combinations: 1, positions: k })[0], WORK_LIMIT, X);
    out.push({ fn: "ENVELOPE", what: `12 spans, 4 loads, full L, 1 combination, ${Xf} x cells`, size: study("ENVELOPE", { spans: 12, loads: 4, cases: 4, pattern: "full", combinations: 1, positions: Xf }), make: () => bind("ENVELOPE", [spans(12), text4, column(Xf, (i) => (60 * i) / (Xf - 1)), [["1.2D+1.6L+0.5S+0.5W"]], null, EI, "moment", "full L", null]) });
  }

  // PEAKS: the issue 15 case (full pattern on 12 spans, the ASCE strength set), then the size limit.
  {
    out.push(arrangementsScenario());
    // Per pattern, combinations first (up to their limit, with 4 loads), then loads (with those combinations).
    for (const pattern of ["full", "standard", "none"] as const) {
      const peaks = (loads: number, combinations: number) => study("PEAKS", { spans: 12, loads, cases: 4, pattern, combinations });
      const k = largest((m) => peaks(4, m)[0], WORK_LIMIT, LIMITS.combinations);
      const L = largest((n) => peaks(n, k)[0], WORK_LIMIT, MAX_LOADS);
      out.push({ fn: "PEAKS", what: `12 spans, ${L} loads, ${pattern} L, ${k} combinations`, size: peaks(L, k), make: () => bind("PEAKS", [spans(12), loads(L, 60), combinations(k), null, EI, `${pattern} L`, null]) });
    }
    const one = { spans: MAX_SPANS, cases: 1, combinations: 1 };
    const L = largest((k) => study("PEAKS", { ...one, loads: k })[0], WORK_LIMIT, MAX_LOADS);
    out.push({ fn: "PEAKS", what: `${MAX_SPANS} spans, ${L} loads (D), 1 combination`, size: study("PEAKS", { ...one, loads: L }), make: () => bind("PEAKS", [spans(MAX_SPANS), loads(L, big.length, ["D"]), [["1.2D"]], null, EI, null, null]) });
  }

  // INFLUENCE: positions x (spans + 1) within its budget.
  for (const n of [1, 12, 100, MAX_SPANS]) {
    const P = largest((k) => study("INFLUENCE", { spans: n, positions: k })[0], WORK_LIMIT, LIMITS.positions);
    out.push({ fn: "INFLUENCE", what: `${n} spans, ${P} positions`, size: study("INFLUENCE", { spans: n, positions: P }), make: () => bind("INFLUENCE", [spans(n), "moment at 2.5", column(P, (i) => (5 * n * i) / Math.max(1, P - 1)), null, EI]) });
  }

  // MOVING: axles within their limit and the budget.
  for (const n of [1, 12, 30, 60]) {
    for (const effect of ["absolute moment", "moment at 2.5", "shear at 2.5", "reaction 1"]) {
      const absoluteMoment = effect === "absolute moment";
      if (study("MOVING", { spans: n, axles: 1, absoluteMoment })[0] > WORK_LIMIT) continue;
      const a = largest((k) => study("MOVING", { spans: n, axles: k, absoluteMoment })[0], WORK_LIMIT, LIMITS.axles);
      out.push({ fn: "MOVING", what: `${n} spans, ${a} axles, ${effect}`, size: study("MOVING", { spans: n, axles: a, absoluteMoment }), make: () => bind("MOVING", [spans(n), [Array(a).fill(10)], [Array(a - 1).fill(0.3)], effect, null, EI]) });
    }
  }

  const v = LIMITS.variableCases;
  const labels = Array.from({ length: v }, (_, i) => `Q${i}`);
  out.push({ fn: "COMBOS", what: `EN1990-6.10, ${v} variable cases, ${LIMITS.psi0Pairs} psi0 pairs`, make: () => bind("COMBOS", ["EN1990-6.10", labels.map((l) => `${l} 0.${(fresh++ % 9) + 1}`).join(", "), [labels]]) });
  out.push({ fn: "COMBOS", what: "ASCE7-2.3.1", make: () => bind("COMBOS", ["ASCE7-2.3.1", null, null]) });

  out.push({ fn: "SECTION", what: "I section, units", make: () => bind("SECTION", ["I", [[400 + (fresh++ % 10), 180, 13.5, 8.6]], "mm", "in"]) });
  out.push({ fn: "SECTION", what: "tee section", make: () => bind("SECTION", ["tee", [[300, 200 + (fresh++ % 10), 15, 10]], null, null]) });
  const cells = LIMITS.cells;
  out.push({ fn: "UTILISATION", what: `${cells} demand cells, one capacity each, units`, make: () => bind("UTILISATION", [column(cells, (i) => i + fresh), column(cells, (i) => 2 * i + 1), "kip*ft", "kN*m"]) });
  out.push({ fn: "CONVERT", what: `${cells} cells`, make: () => bind("CONVERT", [column(cells, (i) => i + fresh), "kip/ft", "kN/m"]) });
  out.push({ fn: "STIFFNESS", what: `${cells} cells (E per span, one I)`, make: () => bind("STIFFNESS", [column(cells, (i) => 29000 + i + fresh), [[510]], "ksi", "in^4", "kip*ft^2"]) });
  return out;
}

function outcome(value: unknown): string {
  if (Array.isArray(value)) return `${value.length} rows`;
  return String(value).slice(0, 60);
}

export async function run(): Promise<void> {
  const dir = await buildAddin();
  const fns = loadBundle(path.join(dir, "functions.js"));
  const names = Object.keys(fns);
  console.log(`production bundle ${path.join(dir, "functions.js")} (${names.length} functions)`);
  const before = os.loadavg();
  console.log(`load average ${before.map((l) => l.toFixed(1)).join(" ")} on ${os.cpus().length} cores (other work inflates wall times; CPU time is this process's own)`);
  const worst = new Map<string, { median: number; worst: number; wall: number; what: string }>();
  // LIMITS_ONLY=MOVING,PEAKS measures those functions only.
  const only = process.env.LIMITS_ONLY ? process.env.LIMITS_ONLY.split(",") : null;
  for (const s of scenarios().filter((c) => !only || only.includes(c.fn))) {
    const t = timeScenario(s, fns);
    const size = s.size ? `  size ${s.size[0]} of ${s.size[1]}` : "";
    console.log(`  ${s.fn.padEnd(15)} ${s.what.padEnd(58)} CPU median ${t.median.toFixed(1).padStart(6)} worst ${t.worst.toFixed(1).padStart(6)} ms  wall max ${t.wall.toFixed(1).padStart(7)} ms  ${outcome(t.result)}${size}`);
    if (s.target) reportTarget(s.target(t));
    const w = worst.get(s.fn);
    if (!w || t.median > w.median) worst.set(s.fn, { median: t.median, worst: t.worst, wall: t.wall, what: s.what });
  }
  console.log(`\nworst scenario per function (by median; process CPU of ${Math.max(1, REPS - 1)} repetitions after a warm-up: median and slowest; target ${TARGET_MS} ms):`);
  for (const name of names) {
    const w = worst.get(name);
    if (!w) {
      console.log(`  ${name.padEnd(15)} NOT MEASURED`);
      continue;
    }
    const verdict = w.median <= TARGET_MS && w.worst <= TARGET_MS ? "PASS" : w.median <= TARGET_MS ? "MISS (slowest over)" : "MISS";
    console.log(`  ${name.padEnd(15)} median ${w.median.toFixed(1).padStart(7)} worst ${w.worst.toFixed(1).padStart(7)} ms CPU (wall up to ${w.wall.toFixed(1)} ms)  ${verdict}  [${w.what}]`);
  }
  console.log(`load average after ${os.loadavg().map((l) => l.toFixed(1)).join(" ")}`);
}
