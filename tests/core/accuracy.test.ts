/**
 * Right or refused, at the core: members that double precision answered wrongly or refused,
 * each with its input and expected value. Sources: hand statics for the determinate members;
 * beam-diagram formulas of a steel construction manual (propped cantilever with a central
 * load: deflection 7PL^3/768EI under the load, end slope PL^2/32EI; from memory), confirmed
 * by the exact force method in BigInt fixed point (kit/exactForceMethod.ts).
 */
import { readFileSync } from "fs";
import { join } from "path";
import { diagram, solve, valueAt, type Member, type Quantity } from "../../src/core";
import { exactForceMethodSolve } from "./kit/exactForceMethod";
import { beam, point, udl } from "./kit/members";

type Check = { reaction: number; force?: number; moment?: number } | { quantity: Quantity; x: number; value: number };

const cases: [string, Member, Check[]][] = [
  [
    "0.05 link between a pin and a hinge, 8 cantilever, udl 1, EI 50000 (statics: 0.025, 0, 8.025; M -32.2)",
    beam([0.05, 8], ["pin", "hinge", "fixed"], [udl(1, 0, 8.05)], 50000),
    [{ reaction: 0, force: 0.025 }, { reaction: 1, force: 0 }, { reaction: 2, force: 8.025, moment: -32.2 }, { quantity: "moment", x: 0.05, value: 0 }],
  ],
  [
    "0.03125 drop-in link (statics: 0.015625, 0, 8.015625; M -32.125)",
    beam([0.03125, 8], ["pin", "hinge", "fixed"], [udl(1, 0, 8.03125)], 50000),
    [{ reaction: 0, force: 0.015625 }, { reaction: 2, force: 8.015625, moment: -32.125 }, { quantity: "shear", x: 0.03125, value: -0.015625 }],
  ],
  [
    "simple span of 6 on springs of 1e-9 (EI 1000), udl 1 (statics: 3 and 3; rigid drop 3e9)",
    beam([6], [1e-9, 1e-9], [udl(1, 0, 6)], 1000),
    [{ reaction: 0, force: 3 }, { reaction: 1, force: 3 }, { quantity: "moment", x: 3, value: 4.5 }, { quantity: "deflection", x: 0, value: 3e9 }],
  ],
  [
    "simple span of 6 on springs of 1e12 x EI/L^3 (statics: 3 and 3)",
    beam([6], [1000 / 216 * 1e12, 1000 / 216 * 1e12], [udl(1, 0, 6)], 1000),
    [{ reaction: 0, force: 3 }, { reaction: 1, force: 3 }, { quantity: "moment", x: 3, value: 4.5 }],
  ],
  [
    "propped cantilever 1 (EI 1e6) with a soft free overhang 10 (EI 1), P 1 at 0.5: 7PL^3/768EI under the load, not 0",
    beam([1, 10], ["fixed", "pin", "free"], [point(1, 0.5)], [1e6, 1]),
    [{ quantity: "deflection", x: 0.5, value: 7 / 768e6 }, { quantity: "slope", x: 1, value: -1 / 32e6 }, { quantity: "deflection", x: 11, value: -10 / 32e6 }],
  ],
];

describe("members double precision got wrong: exact to 1e-9 of each quantity's own scale", () => {
  test.each(cases)("%s", (_, m, checks) => {
    const sol = solve(m);
    const exact = exactForceMethodSolve(m);
    const own = (q: Quantity): number => Math.max(...diagram(sol, 201).map((r) => Math.abs(r[q])));
    const off: string[] = [];
    for (const c of checks) {
      if ("reaction" in c) {
        const scale = Math.max(...exact.reactions.map((r) => Math.abs(c.force !== undefined ? r.force : r.moment)));
        if (c.force !== undefined && !(Math.abs(sol.reactions[c.reaction].force - c.force) <= 1e-9 * scale)) off.push(`R${c.reaction} = ${sol.reactions[c.reaction].force}, expected ${c.force}`);
        if (c.moment !== undefined && !(Math.abs(sol.reactions[c.reaction].moment - c.moment) <= 1e-9 * Math.abs(c.moment))) off.push(`M${c.reaction} = ${sol.reactions[c.reaction].moment}, expected ${c.moment}`);
      } else {
        const got = valueAt(sol, c.quantity, c.x);
        const scale = own(c.quantity);
        if (!(Math.abs(got - c.value) <= 1e-9 * scale)) off.push(`${c.quantity}(${c.x}) = ${got}, expected ${c.value}`);
        if (!(Math.abs(exact.at(c.quantity, c.x) - c.value) <= 1e-9 * scale)) off.push(`the exact kit gives ${c.quantity}(${c.x}) = ${exact.at(c.quantity, c.x)}, the case says ${c.value}`);
      }
    }
    expect(off).toEqual([]);
  });
});

describe("a refusal names the ratio that causes it", () => {
  test("a spring 1e-40 of the span's EI/L^3 beside a stiff span cannot be resolved even in extended precision", () => {
    const m = beam([6], [1e-40, 1e-40], [udl(1, 0, 6)], 1000);
    let message = "";
    try {
      solve(m);
    } catch (error) {
      message = (error as Error).message;
    }
    expect(message).toMatch(/spring at node \d is .* times the EI\/L\^3 of the span beside it/);
  });
});

describe("extended precision stays within the functions bundle's language level", () => {
  // The bundle must run where the host's custom-functions runtime offers ES2016 (BigInt is
  // ES2020): double-double needs only + - * / on doubles. Tests may use BigInt (kit/fixed.ts).
  test.each(["doubleDouble.ts", "precise.ts", "solve.ts", "banded.ts", "refine.ts", "positions.ts", "section.ts", "elementLoads.ts", "pieces.ts"])("src/core/%s uses no BigInt", (name) => {
    const text = readFileSync(join(__dirname, "..", "..", "src", "core", name), "utf8").replace(/\/\*[\s\S]*?\*\/|\/\/.*$/gm, "");
    expect(/\bBigInt\b|\bbigint\b|\b\d+n\b/.test(text)).toBe(false);
  });
});
