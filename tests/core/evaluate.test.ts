import { solve } from "../../src/core/solve";
import { valueAt, valuesAt } from "../../src/core/evaluate";
import type { Quantity } from "../../src/core/model";
import { HANDBOOK_TOLERANCE } from "../../src/core/tolerance";
import { couple, member, point, udl } from "./support/build";
import { caught } from "./support/expectError";
import { expectClose } from "./support/expectClose";

const L = 10;
const P = 6;
const w = 2;

describe("valueAt: which side of a jump", () => {
  // Simple beam, point load P at 4 (steel construction manual, beam diagrams and formulas, case 8, from memory):
  // V = 0.6P left of the load, -0.4P right of it.
  const s = solve(member({ spans: [L], EI: 100, loads: [point(P, 4)] }));
  const cases: [string, Quantity, number, number][] = [
    ["left end gives the value just right (the reaction's shear)", "shear", 0, 0.6 * P],
    ["at the load, the value just right", "shear", 4, -0.4 * P],
    ["right end gives the value just left", "shear", L, -0.4 * P],
    ["moment at the load", "moment", 4, 0.24 * P * L],
    ["moment is zero at the right end", "moment", L, 0],
  ];
  test.each(cases)("%s", (_name, q, x, expected) => {
    expectClose(`${q} at ${x}`, valueAt(s, q, x), expected, HANDBOOK_TOLERANCE, P * L);
  });

  test("a couple's moment jump: just right of it (formulas for stress and strain handbook, simply supported, intermediate couple, from memory)", () => {
    const c = solve(member({ spans: [L], loads: [couple(20, 4)] }));
    expectClose("M at 4", valueAt(c, "moment", 4), (20 * 6) / L, HANDBOOK_TOLERANCE, 20);
    expectClose("M at 3.999", valueAt(c, "moment", 3.999), (-20 * 3.999) / L, HANDBOOK_TOLERANCE, 20);
  });

  test("an interior support's reaction jump: just right of it (two equal spans, uniform load, steel construction manual case 32, from memory)", () => {
    const c = solve(member({ spans: [L, L], loads: [udl(w, 0, 2 * L)] }));
    expectClose("V at the middle support", valueAt(c, "shear", L), (5 * w * L) / 8, HANDBOOK_TOLERANCE, w * L);
  });

  test("point load at the right end: the value just left ignores it, the reaction takes it", () => {
    const c = solve(member({ spans: [L], supports: ["fixed", "free"], EI: 100, loads: [point(P, L)] }));
    expectClose("V at the tip", valueAt(c, "shear", L), P, HANDBOOK_TOLERANCE, P);
    expectClose("fixed end reaction", c.reactions[0].force, P, HANDBOOK_TOLERANCE, P);
  });
});

describe("valueAt: positions within rounding of the ends are on the member", () => {
  const s = solve(member({ spans: [0.7, 0.1], EI: 100, loads: [udl(w, 0, 0.7)] }));
  test.each([0.8, 0.7 + 0.1, 0, -0])("x = %d", (x) => {
    expect(Number.isFinite(valueAt(s, "moment", x))).toBe(true);
  });
});

describe("valueAt: errors", () => {
  const s = solve(member({ spans: [L], loads: [point(P, 4)] }));
  const withEI = solve(member({ spans: [L], EI: 1, loads: [point(P, 4)] }));
  test.each([-0.5, L + 0.5, 1e9])("x = %d outside the member is #VALUE! naming x and the member's extent", (x) => {
    const error = caught(() => valueAt(withEI, "moment", x));
    expect(error.code).toBe("#VALUE!");
    expect(error.message).toContain(String(x));
    expect(error.message).toContain(String(L));
  });
  test.each([NaN, Infinity, -Infinity])("x = %d is #VALUE!", (x) => {
    expect(caught(() => valueAt(withEI, "shear", x)).code).toBe("#VALUE!");
  });
  test.each(["slope", "deflection"] as Quantity[])("%s without EI is #N/A and says EI is needed", (q) => {
    const error = caught(() => valueAt(s, q, 2));
    expect(error.code).toBe("#N/A");
    expect(error.message).toMatch(/EI/);
  });
});

describe("valuesAt", () => {
  test("is valueAt at each position, in order", () => {
    const s = solve(member({ spans: [4, 6], supports: ["fixed", "pin", "free"], EI: 50, loads: [udl(w, 1, 9), point(P, 10)] }));
    const xs = [0, 1, 2.5, 4, 7, 10];
    for (const q of ["shear", "moment", "slope", "deflection"] as Quantity[]) {
      expect(valuesAt(s, q, xs)).toEqual(xs.map((x) => valueAt(s, q, x)));
    }
    expect(valuesAt(s, "moment", [])).toEqual([]);
  });
});
