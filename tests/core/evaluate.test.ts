/** valueAt / valuesAt: jump semantics, the member ends, and the error paths. */
import { solve, tolerance, valueAt, valuesAt } from "../../src/core";
import { thrown } from "./kit/errors";
import { beam, couple, point, udl } from "./kit/members";

const near = (a: number, b: number) => tolerance.relClose(a, b, tolerance.HANDBOOK_TOLERANCE, 1);

describe("values at jumps: just right of x, and just left at the right end", () => {
  // simple span L = 10, P = 6 at 4: R_A = 3.6, R_B = 2.4 (statics)
  const sol = solve(beam([10], ["pin", "pin"], [point(6, 4)], 1e3));

  it("shear at the left end is the left reaction (just right of 0)", () => expect(near(valueAt(sol, "shear", 0), 3.6)).toBe(true));
  it("shear at a point load is the value past it", () => expect(near(valueAt(sol, "shear", 4), 3.6 - 6)).toBe(true));
  it("shear just before a point load is the value before it", () => expect(near(valueAt(sol, "shear", 4 - 1e-9), 3.6)).toBe(true));
  it("shear at the right end is the value just left of the reaction", () => expect(near(valueAt(sol, "shear", 10), -2.4)).toBe(true));
  it("moment at the point load is R_A·a (steel construction manual, case 8, from memory)", () => expect(near(valueAt(sol, "moment", 4), 3.6 * 4)).toBe(true));
  it("moment at the right end is zero", () => expect(near(valueAt(sol, "moment", 10), 0)).toBe(true));

  it("a point load at a cantilever's free right end: the value just left ignores it, the reaction takes it", () => {
    const s = solve(beam([10], ["fixed", "free"], [point(6, 10)], 100));
    expect(near(valueAt(s, "shear", 10), 6)).toBe(true);
    expect(near(s.reactions[0].force, 6)).toBe(true);
  });

  it("moment at a couple is the value past it (a clockwise couple raises M)", () => {
    const s = solve(beam([10], ["pin", "pin"], [couple(5, 4)]));
    // R_A = -C/L = -0.5: M(4-) = -2, M(4+) = -2 + 5 = 3
    expect(near(valueAt(s, "moment", 4), 3)).toBe(true);
    expect(near(valueAt(s, "moment", 4 - 1e-9), -2)).toBe(true);
  });

  it("at an interior support the shear is the value right of the reaction", () => {
    // two equal spans, UDL w = 2, L = 5: V(5-) = -5wL/8, V(5+) = +5wL/8 (coefficient tables, from memory)
    const s = solve(beam([5, 5], ["pin", "pin", "pin"], [udl(2, 0, 10)]));
    expect(near(valueAt(s, "shear", 5), 6.25)).toBe(true);
    expect(near(valueAt(s, "shear", 5 - 1e-9), -6.25)).toBe(true);
  });

  it("at a hinge the slope is the value right of it", () => {
    // two equal cantilevers w = 2, L = 3 joined by a hinge: slope left wL³/6EI, right -wL³/6EI (cantilever formula, from memory)
    const s = solve(beam([3, 3], ["fixed", "hinge", "fixed"], [udl(2, 0, 6)], 100));
    expect(near(valueAt(s, "slope", 3), -0.09)).toBe(true);
    expect(near(valueAt(s, "slope", 3 - 1e-7), 0.09)).toBe(true);
  });

  it("positions within rounding of the ends are the ends", () => {
    const s = solve(beam([0.7, 0.1], ["pin", "pin", "pin"], [point(1, 0.8), udl(1, 0, 0.8)]));
    expect(valueAt(s, "shear", 0.8)).toBe(valueAt(s, "shear", 0.7 + 0.1));
    expect(() => valueAt(s, "moment", -1e-17)).not.toThrow();
    for (const x of [0, -0]) expect(Number.isFinite(valueAt(s, "moment", x))).toBe(true);
  });

  it("valuesAt is valueAt at each x, in order, for every quantity; no positions give no values", () => {
    const xs = [0, 2.5, 4, 7.25, 10];
    for (const q of ["shear", "moment", "slope", "deflection"] as const) expect(valuesAt(sol, q, xs)).toEqual(xs.map((x) => valueAt(sol, q, x)));
    expect(valuesAt(sol, "moment", [])).toEqual([]);
  });
});

describe("valueAt errors", () => {
  const sol = solve(beam([4, 4], ["pin", "pin", "pin"], [udl(1, 0, 8)], 500));
  const noEI = solve(beam([4, 4], ["pin", "pin", "pin"], [udl(1, 0, 8)]));

  it.each([[-0.5], [8.5], [1e9]])("x = %p outside the member is #VALUE! naming x and the member's extent", (x) => {
    const error = thrown(() => valueAt(sol, "moment", x));
    expect(error.code).toBe("#VALUE!");
    expect(error.message).toMatch(/^x/);
    expect(error.message).toContain(String(x));
    expect(error.message).toContain("8");
  });

  it.each([[NaN], [Infinity], [-Infinity]])("x = %p is #VALUE! naming x", (x) => {
    const error = thrown(() => valueAt(sol, "shear", x));
    expect(error.code).toBe("#VALUE!");
    expect(error.message).toMatch(/^x/);
  });

  it.each(["slope", "deflection"] as const)("%s without EI is #N/A saying EI is needed", (q) => {
    const error = thrown(() => valueAt(noEI, q, 2));
    expect(error.code).toBe("#N/A");
    expect(error.message).toMatch(/EI/);
  });

  it("shear and moment need no EI, and agree with the member solved with EI", () => {
    expect(near(valueAt(noEI, "moment", 4), valueAt(sol, "moment", 4))).toBe(true);
    expect(near(valueAt(noEI, "moment", 4), -2)).toBe(true); // -wL²/8, two equal spans (coefficient tables, from memory)
  });
});
