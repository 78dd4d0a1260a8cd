/**
 * extremes(): a table of peaks with known values and places (both sides of jumps, leftmost x on
 * ties, peaks at irrational x inside a piece), and on random members: the max and min are
 * attained at their x and no value of the independent force-method solution goes beyond them.
 */
import fc from "fast-check";
import { extremes, solve, type Member, type Quantity } from "../../src/core";
import { HANDBOOK_TOLERANCE, POSITION_TOLERANCE } from "../../src/core/tolerance";
import { expectClose } from "./kit/close";
import { thrown } from "./kit/errors";
import { forceMethodSolve } from "./kit/forceMethod";
import { lengthOf, linear, member, point, scalesOf, udl } from "./kit/members";
import { loadedMember, runs } from "./kit/random";

const L = 9;
const w = 4;
const EI = 700;

interface Case {
  name: string;
  member: Member;
  quantity: Quantity;
  max: number;
  xMax: number;
  min: number;
  xMin: number;
}

const W = (w * L) / 2;
const cases: Case[] = [
  {
    // steel construction manual, beam diagrams and formulas, case 1 (from memory)
    name: "simple beam, uniform load: moment",
    member: member({ spans: [L], EI, loads: [udl(w, 0, L)] }),
    quantity: "moment",
    max: (w * L * L) / 8,
    xMax: L / 2,
    min: 0,
    xMin: 0,
  },
  {
    // steel construction manual, beam diagrams and formulas, case 1 (from memory); shear peaks at both ends
    name: "simple beam, uniform load: shear",
    member: member({ spans: [L], EI, loads: [udl(w, 0, L)] }),
    quantity: "shear",
    max: (w * L) / 2,
    xMax: 0,
    min: (-w * L) / 2,
    xMin: L,
  },
  {
    // steel construction manual, beam diagrams and formulas, case 1 (from memory)
    name: "simple beam, uniform load: deflection",
    member: member({ spans: [L], EI, loads: [udl(w, 0, L)] }),
    quantity: "deflection",
    max: (5 * w * L ** 4) / (384 * EI),
    xMax: L / 2,
    min: 0,
    xMin: 0,
  },
  {
    // steel construction manual, beam diagrams and formulas, case 2 (from memory): peak moment at L/√3
    name: "simple beam, load increasing to one end: moment peak off the grid of load points",
    member: member({ spans: [L], EI, loads: [linear(0, w, 0, L)] }),
    quantity: "moment",
    max: (2 * W * L) / (9 * Math.sqrt(3)),
    xMax: L / Math.sqrt(3),
    min: 0,
    xMin: 0,
  },
  {
    // steel construction manual, beam diagrams and formulas, case 2 (from memory): peak deflection
    // 0.01304 W L³/EI at x = L·√(1 − √(8/15)); the value here is the exact formula at that x.
    name: "simple beam, load increasing to one end: deflection peak",
    member: member({ spans: [L], EI, loads: [linear(0, w, 0, L)] }),
    quantity: "deflection",
    max: (() => {
      const x = L * Math.sqrt(1 - Math.sqrt(8 / 15));
      return ((W * x) / (180 * EI * L * L)) * (3 * x ** 4 - 10 * L * L * x * x + 7 * L ** 4);
    })(),
    xMax: L * Math.sqrt(1 - Math.sqrt(8 / 15)),
    min: 0,
    xMin: 0,
  },
  {
    // steel construction manual, beam diagrams and formulas, case 15 (from memory): the hogging peak
    // is reached at both ends; the leftmost is reported.
    name: "fixed both ends, uniform load: moment, tie at both ends",
    member: member({ spans: [L], supports: ["fixed", "fixed"], EI, loads: [udl(w, 0, L)] }),
    quantity: "moment",
    max: (w * L * L) / 24,
    xMax: L / 2,
    min: (-w * L * L) / 12,
    xMin: 0,
  },
  {
    // steel construction manual, beam diagrams and formulas, case 8 (from memory): shear peaks on both
    // sides of the load's jump
    name: "simple beam, point load: shear on both sides of the jump",
    member: member({ spans: [L], loads: [point(6, 3)] }),
    quantity: "shear",
    max: (6 * 6) / L,
    xMax: 0,
    min: (-6 * 3) / L,
    xMin: 3,
  },
  {
    // continuous-beam coefficient tables, from memory: two equal spans, uniform load, peak 9wL²/128
    // at 3L/8 in each span; the leftmost is reported
    name: "two equal spans, uniform load: moment, tie between the spans",
    member: member({ spans: [8, 8], loads: [udl(1, 0, 16)] }),
    quantity: "moment",
    max: (9 * 64) / 128,
    xMax: 3,
    min: -8,
    xMin: 8,
  },
];

describe.each(cases)("$name", (c) => {
  test("max, min and where", () => {
    const e = extremes(solve(c.member), c.quantity);
    const scale = scalesOf(c.member)[c.quantity];
    const length = lengthOf(c.member);
    expectClose("max", e.max, c.max, HANDBOOK_TOLERANCE, scale);
    expectClose("min", e.min, c.min, HANDBOOK_TOLERANCE, scale);
    expectClose("x at max", e.xMax, c.xMax, HANDBOOK_TOLERANCE, length);
    expectClose("x at min", e.xMin, c.xMin, HANDBOOK_TOLERANCE, length);
  });
});

describe("extremes: errors", () => {
  test.each(["slope", "deflection"] as Quantity[])("%s without EI is #N/A", (q) => {
    expect(thrown(() => extremes(solve(member({ spans: [L], loads: [udl(w, 0, L)] })), q)).code).toBe("#N/A");
  });
});

describe("extremes against the independent reference on random members", () => {
  test("the max and min are attained at their x (on one side) and no sampled value goes beyond them", () => {
    const quantities: Quantity[] = ["shear", "moment", "slope", "deflection"];
    fc.assert(
      fc.property(loadedMember, (m) => {
        const s = solve(m);
        const ref = forceMethodSolve(m);
        const length = lengthOf(m);
        const scale = scalesOf(m);
        for (const q of quantities) {
          const e = extremes(s, q);
          const tol = HANDBOOK_TOLERANCE * scale[q];
          expect(e.xMax).toBeGreaterThanOrEqual(0);
          expect(e.xMax).toBeLessThanOrEqual(length * (1 + POSITION_TOLERANCE));
          const sides = (x: number) => [...(x > 0 ? ["left" as const] : []), ...(x < length ? ["right" as const] : [])];
          const attained = (x: number, v: number) => sides(x).some((side) => Math.abs(ref.at(q, x, side) - v) <= tol);
          expect({ q, x: e.xMax, attained: attained(e.xMax, e.max) }).toEqual({ q, x: e.xMax, attained: true });
          expect({ q, x: e.xMin, attained: attained(e.xMin, e.min) }).toEqual({ q, x: e.xMin, attained: true });
          const beyond: string[] = [];
          for (let i = 0; i <= 120; i++) {
            const x = (length * i) / 120;
            for (const side of sides(x)) {
              const v = ref.at(q, x, side);
              if (v > e.max + tol || v < e.min - tol) beyond.push(`${q} ${v} at ${x} (${side})`);
            }
          }
          expect(beyond).toEqual([]);
        }
      }),
      runs(40),
    );
  });
});
