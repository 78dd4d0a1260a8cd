/**
 * Every worksheet function, fuzzed with host-shaped garbage (tests/hardening/arbitraries.ts):
 * wrong shapes, text in number cells, error values, NaN and Infinity, enormous and tiny
 * numbers, duplicate positions, zero-length spans, loads exactly on nodes and hinges, random
 * support layouts, and 100,000-row load tables. Each call must return finite numbers and
 * strings of the documented shape, or throw #VALUE!/#N/A with a message of our own; nothing
 * else may escape. Seeded, so a failure reproduces. Speed is not asserted here: the slowest
 * call is measured by `node tests/bench/run.js fuzz`; the generous test timeout only catches hangs.
 */
import fc from "fast-check";
import * as fx from "../../functions/functions";
import { largeLoadTable, plan, positionsArg } from "./arbitraries";
import { outcomeOf, violations, type Outcome } from "./outcome";
import { SPECS } from "./worksheetCases";

const SEED = 20240808;
const RUNS_PER_FUNCTION = 520;
const MIN_TOTAL_CASES = 10_000;
const HANG_GUARD_MS = 120_000;

let total = 0;

describe("control: the contract check catches every kind of violation", () => {
  const bad: [string, Outcome][] = [
    ["NaN in a result", { kind: "value", value: [[1, NaN]] }],
    ["Infinity in a result", { kind: "value", value: [[Infinity]] }],
    ["null in a result", { kind: "value", value: [[null]] }],
    ["undefined in a result", { kind: "value", value: [[1, undefined]] }],
    ["a boolean in a result", { kind: "value", value: [[true]] }],
    ["a ragged result", { kind: "value", value: [[1, 2], [3]] }],
    ["a scalar result", { kind: "value", value: 3 }],
    ["an empty result", { kind: "value", value: [] }],
    ["a TypeError", { kind: "error", thrown: new TypeError("x is undefined") }],
    ["a string thrown", { kind: "error", thrown: "boom" }],
    ["an error code of another kind", { kind: "error", thrown: { code: "#NUM!", message: "overflow" } }],
    ["an error without a message", { kind: "error", thrown: { code: "#VALUE!", message: " " } }],
    ["an internal failure wrapped as #VALUE!", { kind: "error", thrown: { code: "#VALUE!", message: "unexpected problem: Cannot read properties of undefined" } }],
  ];
  test.each(bad)("%s is a violation", (_name, outcome) => {
    expect(violations(outcome, {}).length).toBeGreaterThan(0);
  });

  test("a wrong shape is a violation; the right one is not", () => {
    const value = { kind: "value" as const, value: [[0, 1, 0], [6, 2, 0]] };
    expect(violations(value, { rows: 2, cols: 3 })).toEqual([]);
    expect(violations(value, { rows: 3, cols: 3 }).length).toBe(1);
    expect(violations(value, { rows: 2, cols: 2 }).length).toBe(1);
    expect(violations({ kind: "error", thrown: { code: "#N/A", message: "deflection needs EI" } }, {})).toEqual([]);
  });

  test("the shape oracle of every function accepts a real result (so it is not vacuously strict)", () => {
    const spans = [["6 4"]];
    const loads = [["udl 2 D; point 5 at 6 L"]];
    const x = [[1, 2], [3, ""]];
    const checks: [string, unknown[]][] = [
      ["reactions", [spans, loads, null, null, null]],
      ["moment", [spans, loads, x, null, null, null]],
      ["deflection", [spans, loads, x, null, [[100]], null]],
      ["extremes", [spans, loads, null, [[100]], null]],
      ["diagram", [spans, loads, 11, null, null, null]],
      ["envelope", [spans, loads, x, [["1.2D+1.6L"], ["D+L"]], null, null, null, null, null]],
      ["peaks", [spans, loads, "ASCE7-2.3.1", null, [[100]], "full L", null]],
      ["influence", [spans, "moment at 3", x, null, null]],
      ["moving", [spans, "10 20", "2", "absolute moment", null, null]],
      ["deflectionCheck", [spans, loads, "L/360", null, [[100]], null, null]],
    ];
    for (const [name, args] of checks) {
      const spec = SPECS.find((s) => s.name === name)!;
      const outcome = outcomeOf(() => spec.call(args));
      expect({ name, problems: violations(outcome, spec.shape({ args, spanCount: 2 })), kind: outcome.kind }).toEqual({ name, problems: [], kind: "value" });
    }
  });
});

describe("regressions the fuzz found", () => {
  test("MOVING absolute moment with axles a subnormal distance apart (probe counts differed between samples: a TypeError)", () => {
    const spec = SPECS.find((s) => s.name === "moving")!;
    const args = [[[1, 19.87]], [["1.6166076998359256e-133 0"]], [[5e-324]], "absolute moment", [["fixed", "pin", "fixed"]], null];
    expect(violations(outcomeOf(() => spec.call(args)), spec.shape({ args, spanCount: 2 }))).toEqual([]);
  });
});

describe("fuzzed worksheet functions fail safe", () => {
  test("SPECS covers every export of functions/functions.ts", () => {
    expect(SPECS.map((s) => s.name).sort()).toEqual(Object.keys(fx).filter((k) => typeof (fx as Record<string, unknown>)[k] === "function").sort());
  });

  test.each(SPECS.map((s) => [s.name, s] as const))(
    "%s: finite cells of the documented shape, or #VALUE!/#N/A with a message",
    (_name, spec) => {
      let values = 0;
      fc.assert(
        fc.property(spec.cases, (c) => {
          total++;
          const outcome = outcomeOf(() => spec.call(c.args));
          if (outcome.kind === "value") values++;
          const problems = violations(outcome, spec.shape(c));
          if (problems.length > 0) throw new Error(`${spec.name}(${JSON.stringify(c.args).slice(0, 600)}): ${problems.join("; ")}`);
        }),
        { numRuns: RUNS_PER_FUNCTION, seed: SEED },
      );
      // The generators must reach the computing paths, not only the argument checks.
      if (!["utilisation", "convertUnits", "stiffness", "combos"].includes(spec.name)) expect(values).toBeGreaterThan(RUNS_PER_FUNCTION / 20);
    },
    HANG_GUARD_MS,
  );

  test(
    "100,000-row load tables (blank-padded, one load repeated, every row a load) fail safe too",
    () => {
      const spec = SPECS.filter((s) => ["reactions", "moment", "diagram", "extremes"].includes(s.name));
      fc.assert(
        fc.property(plan, fc.nat(), (p, pick) =>
          fc.assert(
            fc.property(largeLoadTable(p), positionsArg(p), (table, x) => {
              total++;
              const s = spec[pick % spec.length];
              const spans = [p.spans.slice()];
              const args = s.name === "moment" ? [spans, table, x, null, null, null] : s.name === "diagram" ? [spans, table, 21, null, [[1000]], null] : [spans, table, null, null, null];
              const outcome = outcomeOf(() => s.call(args));
              const problems = violations(outcome, s.shape({ args, spanCount: p.spans.length }));
              if (problems.length > 0) throw new Error(`${s.name} with a 100,000-row table: ${problems.join("; ")}`);
            }),
            { numRuns: 1, seed: SEED + pick },
          ),
        ),
        { numRuns: 8, seed: SEED },
      );
    },
    HANG_GUARD_MS,
  );

  test("CI ran at least 10,000 fuzz cases across the functions", () => {
    expect(total).toBeGreaterThanOrEqual(MIN_TOTAL_CASES);
  });
});
