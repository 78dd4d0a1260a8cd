/**
 * Fuzzed members: whatever comes in, the core either throws a SpanError with a message or
 * returns finite numbers everywhere (reactions, values, extremes, diagram rows).
 */
import fc from "fast-check";
import { solve } from "../../src/core/solve";
import { valueAt } from "../../src/core/evaluate";
import { extremes } from "../../src/core/extremes";
import { diagram } from "../../src/core/diagram";
import { isSpanError } from "../../src/core/errors";
import type { Load, Member, Quantity, Support } from "../../src/core/model";
import { member, point, udl } from "./kit/members";
import { thrown } from "./kit/errors";
import { runs } from "./kit/random";

const wild = fc.oneof(
  { weight: 6, arbitrary: fc.double({ min: -1e3, max: 1e3, noNaN: true }).filter((v) => v === 0 || Math.abs(v) >= 1e-12) },
  { weight: 2, arbitrary: fc.constantFrom(0, -0, 1e-9, 1e9, -1e-12) },
  { weight: 1, arbitrary: fc.constantFrom(NaN, Infinity, -Infinity) },
);
const positive = fc.oneof(
  { weight: 6, arbitrary: fc.double({ min: 0.01, max: 100, noNaN: true }) },
  { weight: 2, arbitrary: fc.constantFrom(1e-9, 1e-6, 1e6, 1e12) },
  { weight: 1, arbitrary: wild },
);

const supportArb: fc.Arbitrary<Support> = fc.oneof(
  fc.constantFrom<Support>({ kind: "pin" }, { kind: "fixed" }, { kind: "free" }, { kind: "hinge" }),
  positive.map((stiffness) => ({ kind: "spring" as const, stiffness })),
);

const loadArb: fc.Arbitrary<Load> = fc.record({
  kind: fc.constantFrom<Load["kind"]>("point", "moment", "udl", "linear"),
  magnitude: wild,
  xStart: wild,
  xEnd: wild,
  magnitudeEnd: wild,
  loadCase: fc.constantFrom("", "D", "L"),
  row: fc.integer({ min: 1, max: 50 }),
});

const memberArb: fc.Arbitrary<Member> = fc.integer({ min: 1, max: 4 }).chain((n) =>
  fc.record({
    spans: fc.array(positive, { minLength: n, maxLength: n }),
    supports: fc.array(supportArb, { minLength: n, maxLength: n + 2 }),
    stiffness: fc.option(fc.array(positive, { minLength: n, maxLength: n }), { nil: null }),
    loads: fc.array(loadArb, { maxLength: 4 }),
  }),
);

function onlySpanErrors(action: () => void): void {
  try {
    action();
  } catch (error) {
    if (!isSpanError(error)) throw error;
    expect(["#VALUE!", "#N/A"]).toContain(error.code);
    expect(error.message.length).toBeGreaterThan(10);
  }
}

describe("fuzzed members", () => {
  test("solve, valueAt, extremes and diagram throw only SpanErrors and return only finite numbers", () => {
    fc.assert(
      fc.property(memberArb, fc.double({ min: 0, max: 1, noNaN: true }), (m, f) => {
        onlySpanErrors(() => {
          const s = solve(m);
          for (const r of s.reactions) expect([r.x, r.force, r.moment].every(Number.isFinite)).toBe(true);
          const quantities: Quantity[] = s.hasStiffness ? ["shear", "moment", "slope", "deflection"] : ["shear", "moment"];
          for (const q of quantities) {
            expect(Number.isFinite(valueAt(s, q, f * s.length))).toBe(true);
            const e = extremes(s, q);
            expect([e.max, e.min, e.xMax, e.xMin].every(Number.isFinite)).toBe(true);
          }
          for (const row of diagram(s, 7)) {
            for (const q of quantities) expect(Number.isFinite(row[q])).toBe(true);
          }
        });
      }),
      runs(800),
    );
  });
});

describe("numbers too large or too small for floating point", () => {
  // Valid by every check on its own, yet the exact answer exceeds the largest double
  // (PL³/48EI, wL²/8 with these numbers): it must be an error, never NaN, 0 or Infinity.
  const cases: [string, Member, Quantity, number][] = [
    ["EI of the smallest subnormal", member({ spans: [1], EI: 5e-324, loads: [point(1, 0.5)] }), "deflection", 0.5],
    ["a load of 1e300 over a long span (moment overflows)", member({ spans: [1e6], EI: 1, loads: [udl(1e300, 0, 1e6)] }), "moment", 5e5],
    ["a point load of 1e300 (deflection overflows)", member({ spans: [1e3], EI: 1, loads: [point(1e300, 500)] }), "deflection", 500],
  ];
  test.each(cases)("%s: #VALUE!, since the true value does not fit in a double", (_name, m, q, x) => {
    expect(thrown(() => valueAt(solve(m), q, x)).code).toBe("#VALUE!");
  });
});
