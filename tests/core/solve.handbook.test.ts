/**
 * The solver against closed forms. Each case names where its formulas come from; case
 * numbers of the steel construction manual's beam diagrams and formulas are from memory.
 * Positions in `values` are checked with valueAt (the value just right of x, just left at
 * the member's right end).
 */
import { solve } from "../../src/core/solve";
import { valueAt } from "../../src/core/evaluate";
import type { Member, Quantity } from "../../src/core/model";
import { HANDBOOK_TOLERANCE } from "../../src/core/tolerance";
import { couple, linear, member, point, scales, udl } from "./support/build";
import { expectClose } from "./support/expectClose";

interface Case {
  name: string;
  source: string;
  member: Member;
  /** [node index, vertical reaction (up +), moment reaction (counter-clockwise +)] */
  reactions: [number, number, number][];
  values: [Quantity, number, number][];
}

const L = 8;
const EI = 5000;
const w = 3;
const P = 10;
const C = 12;
const a = 3;
const b = L - a;
const K = 400;

const cases: Case[] = [
  {
    name: "simple beam, uniform load",
    source: "steel construction manual, beam diagrams and formulas, case 1 (from memory)",
    member: member({ spans: [L], EI, loads: [udl(w, 0, L)] }),
    reactions: [
      [0, (w * L) / 2, 0],
      [1, (w * L) / 2, 0],
    ],
    values: [
      ["shear", 0, (w * L) / 2],
      ["shear", L, (-w * L) / 2],
      ["moment", L / 2, (w * L * L) / 8],
      ["moment", a, ((w * a) / 2) * (L - a)],
      ["deflection", L / 2, (5 * w * L ** 4) / (384 * EI)],
      ["deflection", a, ((w * a) / (24 * EI)) * (L ** 3 - 2 * L * a * a + a ** 3)],
      ["slope", 0, (w * L ** 3) / (24 * EI)],
      ["slope", L, (-w * L ** 3) / (24 * EI)],
    ],
  },
  {
    name: "simple beam, load increasing uniformly to one end",
    source: "steel construction manual, beam diagrams and formulas, case 2 (from memory)",
    member: member({ spans: [L], EI, loads: [linear(0, 0, w, L)] }),
    reactions: [
      [0, (w * L) / 2 / 3, 0],
      [1, ((w * L) / 2) * (2 / 3), 0],
    ],
    values: [
      ["moment", L / Math.sqrt(3), (2 * ((w * L) / 2) * L) / (9 * Math.sqrt(3))],
      ["moment", a, (((w * L) / 2) * a * (L * L - a * a)) / (3 * L * L)],
      ["deflection", a, (((w * L) / 2) * a * (3 * a ** 4 - 10 * L * L * a * a + 7 * L ** 4)) / (180 * EI * L * L)],
    ],
  },
  {
    name: "simple beam, load increasing uniformly to centre",
    source: "steel construction manual, beam diagrams and formulas, case 3 (from memory)",
    member: member({ spans: [L], EI, loads: [linear(0, 0, w, L / 2), linear(w, L / 2, 0, L)] }),
    reactions: [
      [0, (w * L) / 4, 0],
      [1, (w * L) / 4, 0],
    ],
    values: [
      ["moment", L / 2, (((w * L) / 2) * L) / 6],
      ["deflection", L / 2, (((w * L) / 2) * L ** 3) / (60 * EI)],
    ],
  },
  {
    name: "simple beam, uniform load partially distributed",
    source: "steel construction manual, beam diagrams and formulas, case 4 (from memory)",
    member: member({ spans: [L], EI, loads: [udl(w, 2, 5)] }),
    reactions: [
      [0, ((w * 3) / (2 * L)) * (2 * 3 + 3), 0],
      [1, ((w * 3) / (2 * L)) * (2 * 2 + 3), 0],
    ],
    values: (() => {
      const r1 = ((w * 3) / (2 * L)) * (2 * 3 + 3);
      return [
        ["moment", 2 + r1 / w, r1 * (2 + r1 / (2 * w))],
        ["shear", 1, r1],
        ["moment", 1, r1],
      ] as [Quantity, number, number][];
    })(),
  },
  {
    name: "simple beam, concentrated load at centre",
    source: "steel construction manual, beam diagrams and formulas, case 7 (from memory)",
    member: member({ spans: [L], EI, loads: [point(P, L / 2)] }),
    reactions: [
      [0, P / 2, 0],
      [1, P / 2, 0],
    ],
    values: [
      ["moment", L / 2, (P * L) / 4],
      ["shear", L / 2, -P / 2],
      ["shear", L / 2 - 1, P / 2],
      ["deflection", L / 2, (P * L ** 3) / (48 * EI)],
      ["slope", 0, (P * L * L) / (16 * EI)],
    ],
  },
  {
    name: "simple beam, concentrated load at any point",
    source: "steel construction manual, beam diagrams and formulas, case 8 (from memory)",
    member: member({ spans: [L], EI, loads: [point(P, a)] }),
    reactions: [
      [0, (P * b) / L, 0],
      [1, (P * a) / L, 0],
    ],
    values: [
      ["moment", a, (P * a * b) / L],
      ["deflection", a, (P * a * a * b * b) / (3 * EI * L)],
      ["deflection", 1, ((P * b * 1) / (6 * EI * L)) * (L * L - b * b - 1)],
    ],
  },
  {
    name: "propped cantilever (pin left, fixed right), uniform load",
    source: "steel construction manual, beam diagrams and formulas, case 12 (from memory)",
    member: member({ spans: [L], supports: ["pin", "fixed"], EI, loads: [udl(w, 0, L)] }),
    reactions: [
      [0, (3 * w * L) / 8, 0],
      [1, (5 * w * L) / 8, (-w * L * L) / 8],
    ],
    values: [
      ["moment", L, (-w * L * L) / 8],
      ["moment", (3 * L) / 8, (9 * w * L * L) / 128],
      ["deflection", a, ((w * a) / (48 * EI)) * (L ** 3 - 3 * L * a * a + 2 * a ** 3)],
    ],
  },
  {
    name: "propped cantilever (pin left, fixed right), concentrated load at centre",
    source: "steel construction manual, beam diagrams and formulas, case 13 (from memory)",
    member: member({ spans: [L], supports: ["pin", "fixed"], EI, loads: [point(P, L / 2)] }),
    reactions: [
      [0, (5 * P) / 16, 0],
      [1, (11 * P) / 16, (-3 * P * L) / 16],
    ],
    values: [
      ["moment", L / 2, (5 * P * L) / 32],
      ["moment", L, (-3 * P * L) / 16],
      ["deflection", L / 2, (7 * P * L ** 3) / (768 * EI)],
    ],
  },
  {
    name: "fixed both ends, uniform load",
    source: "steel construction manual, beam diagrams and formulas, case 15 (from memory)",
    member: member({ spans: [L], supports: ["fixed", "fixed"], EI, loads: [udl(w, 0, L)] }),
    reactions: [
      [0, (w * L) / 2, (w * L * L) / 12],
      [1, (w * L) / 2, (-w * L * L) / 12],
    ],
    values: [
      ["moment", 0, (-w * L * L) / 12],
      ["moment", L / 2, (w * L * L) / 24],
      ["deflection", L / 2, (w * L ** 4) / (384 * EI)],
    ],
  },
  {
    name: "fixed both ends, concentrated load at centre",
    source: "steel construction manual, beam diagrams and formulas, case 16 (from memory)",
    member: member({ spans: [L], supports: ["fixed", "fixed"], EI, loads: [point(P, L / 2)] }),
    reactions: [
      [0, P / 2, (P * L) / 8],
      [1, P / 2, (-P * L) / 8],
    ],
    values: [
      ["moment", L / 2, (P * L) / 8],
      ["moment", L, (-P * L) / 8],
      ["deflection", L / 2, (P * L ** 3) / (192 * EI)],
    ],
  },
  {
    name: "fixed both ends, concentrated load at any point",
    source: "steel construction manual, beam diagrams and formulas, case 17 (from memory)",
    member: member({ spans: [L], supports: ["fixed", "fixed"], EI, loads: [point(P, a)] }),
    reactions: [
      [0, ((P * b * b) / L ** 3) * (3 * a + b), (P * a * b * b) / (L * L)],
      [1, ((P * a * a) / L ** 3) * (a + 3 * b), (-P * a * a * b) / (L * L)],
    ],
    values: [
      ["moment", 0, (-P * a * b * b) / (L * L)],
      ["moment", a, (2 * P * a * a * b * b) / L ** 3],
      ["deflection", a, (P * a ** 3 * b ** 3) / (3 * EI * L ** 3)],
    ],
  },
  {
    name: "cantilever, load increasing uniformly to fixed end",
    source: "steel construction manual, beam diagrams and formulas, case 18 (from memory)",
    member: member({ spans: [L], supports: ["fixed", "free"], EI, loads: [linear(w, 0, 0, L)] }),
    reactions: [
      [0, (w * L) / 2, (((w * L) / 2) * L) / 3],
      [1, 0, 0],
    ],
    values: [
      ["moment", 0, -(((w * L) / 2) * L) / 3],
      ["deflection", L, (((w * L) / 2) * L ** 3) / (15 * EI)],
      ["shear", L, 0],
      ["moment", L, 0],
    ],
  },
  {
    name: "cantilever, uniform load",
    source: "steel construction manual, beam diagrams and formulas, case 19 (from memory)",
    member: member({ spans: [L], supports: ["fixed", "free"], EI, loads: [udl(w, 0, L)] }),
    reactions: [
      [0, w * L, (w * L * L) / 2],
      [1, 0, 0],
    ],
    values: [
      ["moment", 0, (-w * L * L) / 2],
      ["shear", 0, w * L],
      ["deflection", L, (w * L ** 4) / (8 * EI)],
      ["slope", L, (w * L ** 3) / (6 * EI)],
    ],
  },
  {
    name: "cantilever fixed at the right, concentrated load at free end",
    source: "steel construction manual, beam diagrams and formulas, case 22 (from memory)",
    member: member({ spans: [L], supports: ["free", "fixed"], EI, loads: [point(P, 0)] }),
    reactions: [
      [0, 0, 0],
      [1, P, -P * L],
    ],
    values: [
      ["shear", 0, -P],
      ["moment", L, -P * L],
      ["deflection", 0, (P * L ** 3) / (3 * EI)],
      ["slope", 0, (-P * L * L) / (2 * EI)],
    ],
  },
  {
    name: "beam overhanging one support, concentrated load at end of overhang",
    source: "steel construction manual, beam diagrams and formulas, case 26 (from memory)",
    member: member({ spans: [L, a], supports: ["pin", "pin", "free"], EI, loads: [point(P, L + a)] }),
    reactions: [
      [0, (-P * a) / L, 0],
      [1, (P / L) * (L + a), 0],
      [2, 0, 0],
    ],
    values: [
      ["moment", L, -P * a],
      ["shear", L + a, P],
      ["deflection", L + a, ((P * a * a) / (3 * EI)) * (L + a)],
    ],
  },
  {
    name: "continuous beam, two equal spans, uniform load on one span",
    source: "steel construction manual, beam diagrams and formulas, case 29 (from memory)",
    member: member({ spans: [L, L], EI, loads: [udl(w, 0, L)] }),
    reactions: [
      [0, (7 * w * L) / 16, 0],
      [1, (5 * w * L) / 8, 0],
      [2, (-w * L) / 16, 0],
    ],
    values: [
      ["moment", L, (-w * L * L) / 16],
      ["moment", (7 * L) / 16, (49 * w * L * L) / 512],
    ],
  },
  {
    name: "continuous beam, two equal spans, concentrated load at centre of one span",
    source: "steel construction manual, beam diagrams and formulas, case 30 (from memory)",
    member: member({ spans: [L, L], EI, loads: [point(P, L / 2)] }),
    reactions: [
      [0, (13 * P) / 32, 0],
      [1, (11 * P) / 16, 0],
      [2, (-3 * P) / 32, 0],
    ],
    values: [
      ["moment", L / 2, (13 * P * L) / 64],
      ["moment", L, (-3 * P * L) / 32],
    ],
  },
  {
    name: "continuous beam, two equal spans, uniform load",
    source: "steel construction manual, beam diagrams and formulas, case 32 (from memory)",
    member: member({ spans: [L, L], EI, loads: [udl(w, 0, 2 * L)] }),
    reactions: [
      [0, (3 * w * L) / 8, 0],
      [1, (5 * w * L) / 4, 0],
      [2, (3 * w * L) / 8, 0],
    ],
    values: [
      ["moment", L, (-w * L * L) / 8],
      ["moment", (3 * L) / 8, (9 * w * L * L) / 128],
      ["shear", L, (5 * w * L) / 8],
      ["deflection", L, 0],
    ],
  },
  {
    name: "simple beam, clockwise couple at an intermediate point",
    source: "formulas for stress and strain handbook, beam table, simply supported, intermediate couple (from memory)",
    member: member({ spans: [L], EI, loads: [couple(C, a)] }),
    reactions: [
      [0, -C / L, 0],
      [1, C / L, 0],
    ],
    values: [
      ["moment", a - 1, (-C * (a - 1)) / L],
      ["moment", a, (C * b) / L],
      ["shear", a, -C / L],
    ],
  },
  {
    name: "cantilever, clockwise couple at the free end",
    source: "formulas for stress and strain handbook, beam table, cantilever, end couple (from memory)",
    member: member({ spans: [L], supports: ["fixed", "free"], EI, loads: [couple(C, L)] }),
    reactions: [
      [0, 0, C],
      [1, 0, 0],
    ],
    values: [
      ["moment", a, -C],
      ["moment", L, -C],
      ["deflection", L, (C * L * L) / (2 * EI)],
      ["slope", L, (C * L) / EI],
    ],
  },
  {
    name: "simple beam on one spring, concentrated load at centre",
    source: "hand derivation: reactions by statics, centre deflection = PL³/48EI plus half the spring's settlement (P/2)/k",
    member: member({ spans: [L], supports: ["pin", K], EI, loads: [point(P, L / 2)] }),
    reactions: [
      [0, P / 2, 0],
      [1, P / 2, 0],
    ],
    values: [
      ["deflection", L, P / 2 / K],
      ["deflection", L / 2, (P * L ** 3) / (48 * EI) + P / 2 / K / 2],
      ["moment", L / 2, (P * L) / 4],
    ],
  },
  {
    name: "cantilever carrying a suspended span through a hinge, uniform load on the suspended span",
    source: "hand derivation by statics: the hinge passes the suspended span's end shear wb/2 to the cantilever tip",
    member: member({ spans: [a, L], supports: ["fixed", "hinge", "pin"], EI, loads: [udl(w, a, a + L)] }),
    reactions: [
      [0, (w * L) / 2, ((w * L) / 2) * a],
      [1, 0, 0],
      [2, (w * L) / 2, 0],
    ],
    values: [
      ["moment", a, 0],
      ["moment", 0, ((-w * L) / 2) * a],
      ["moment", a + L / 2, (w * L * L) / 8],
      ["deflection", a, (((w * L) / 2) * a ** 3) / (3 * EI)],
    ],
  },
  {
    name: "cantilever of two stiffnesses, concentrated load at the tip",
    source: "hand derivation by virtual work: Δ = P/(3EI₁)(L³ − (L−a)³) + P(L−a)³/(3EI₂)",
    member: member({ spans: [a, b], supports: ["fixed", "free", "free"], EI: [EI, EI / 2], loads: [point(P, L)] }),
    reactions: [
      [0, P, P * L],
      [1, 0, 0],
      [2, 0, 0],
    ],
    values: [
      ["deflection", L, (P / (3 * EI)) * (L ** 3 - b ** 3) + (P * b ** 3) / (3 * (EI / 2))],
      ["moment", a, -P * b],
    ],
  },
];

describe.each(cases)("$name ($source)", (c) => {
  const solution = solve(c.member);
  const scale = scales(c.member);
  test("reactions", () => {
    expect(solution.reactions).toHaveLength(c.member.supports.length);
    for (const [node, force, moment] of c.reactions) {
      expectClose(`force at node ${node}`, solution.reactions[node].force, force, HANDBOOK_TOLERANCE, scale.force);
      expectClose(`moment at node ${node}`, solution.reactions[node].moment, moment, HANDBOOK_TOLERANCE, scale.moment);
      expect(solution.reactions[node].x).toBe(solution.nodeX[node]);
    }
  });
  test.each(c.values)("%s at x = %d", (quantity, x, expected) => {
    expectClose(`${quantity} at ${x}`, valueAt(solution, quantity, x), expected, HANDBOOK_TOLERANCE, scale[quantity]);
  });
});
