/** extremes(): from the polynomials, both sides of jumps, leftmost on ties, and never exceeded. */
import { extremes, solve, tolerance, valueAt, type Quantity } from "../../src/core";
import { thrown } from "./kit/errors";
import { beam, lengthOf, point, scalesOf, udl } from "./kit/members";
import { randomMember } from "./kit/random";

const TOL = tolerance.HANDBOOK_TOLERANCE;

describe("extremes: jumps and ties", () => {
  it("takes both sides of a jump: simple span, centre point load (steel construction manual, from memory)", () => {
    const e = extremes(solve(beam([6], ["pin", "pin"], [point(10, 3)])), "shear");
    expect([e.max, e.xMax, e.min, e.xMin]).toEqual([5, 0, -5, 3].map((v) => expect.closeTo(v, 12)));
  });

  it("leftmost x on ties: two equal spans with a UDL peak at 3L/8 and at 2L - 3L/8", () => {
    const e = extremes(solve(beam([8, 8], ["pin", "pin", "pin"], [udl(1, 0, 16)])), "moment");
    expect(tolerance.relClose(e.xMax, 3, TOL)).toBe(true);
    expect(tolerance.relClose(e.max, (9 * 64) / 128, TOL)).toBe(true);
  });

  it("leftmost x on ties: fixed-fixed UDL, equal end moments", () => {
    const e = extremes(solve(beam([6], ["fixed", "fixed"], [udl(4, 0, 6)])), "moment");
    expect(e.xMin).toBe(0);
    expect(tolerance.relClose(e.min, -12, TOL)).toBe(true);
  });

  it("a peak at an irrational x inside a piece (root of V), not a sampled station", () => {
    // load increasing to one end: M peak at L/√3 (steel construction manual, from memory)
    const e = extremes(solve(beam([9], ["pin", "pin"], [{ ...udl(0, 0, 9), kind: "linear", magnitudeEnd: 6 }])), "moment");
    expect(tolerance.relClose(e.xMax, 9 / Math.sqrt(3), TOL)).toBe(true);
  });

  it.each(["slope", "deflection"] as const)("%s without EI is #N/A", (q) => {
    expect(thrown(() => extremes(solve(beam([4], ["pin", "pin"], [point(1, 1)])), q)).code).toBe("#N/A");
  });
});

describe("extremes on random members bound every sampled value and are attained", () => {
  const quantities: Quantity[] = ["shear", "moment", "slope", "deflection"];
  const scaleKey = { shear: "force", moment: "moment", slope: "slope", deflection: "deflection" } as const;

  it.each(Array.from({ length: 30 }, (_, i) => 500 + 31 * i))("seed %i", (seed) => {
    const m = randomMember(seed);
    const sol = solve(m);
    const L = lengthOf(m);
    const s = scalesOf(m);
    for (const q of quantities) {
      const e = extremes(sol, q);
      const slack = TOL * s[scaleKey[q]];
      for (let i = 0; i <= 400; i++) {
        const v = valueAt(sol, q, (L * i) / 400);
        expect(v).toBeLessThanOrEqual(e.max + slack);
        expect(v).toBeGreaterThanOrEqual(e.min - slack);
      }
      // attained at its x: on the right side of x, or on the left side (a jump's left value)
      const sides = (x: number) => [valueAt(sol, q, x), x > 0 ? valueAt(sol, q, x - 1e-9 * L) : valueAt(sol, q, x)];
      expect(sides(e.xMax).some((v) => Math.abs(v - e.max) <= 1e3 * slack)).toBe(true);
      expect(sides(e.xMin).some((v) => Math.abs(v - e.min) <= 1e3 * slack)).toBe(true);
    }
  });
});
