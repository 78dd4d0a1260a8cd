import { influenceLine, type Effect } from "../../src/core";
import { beam, point } from "./kit/members";
import { solve, valueAt } from "../../src/core";
import { HANDBOOK_TOLERANCE, relDiff } from "../../src/core/tolerance";

const L = 8;
const positions = [0, 0.5, 1.7, 3, 4.25, 5, 6.6, 7.9, 8];

// Closed forms by the Muller-Breslau principle (any structural analysis textbook on
// influence lines; from memory): the ordinate is the deflected shape produced by a unit
// displacement of the released effect.
const cases: Array<{ name: string; member: ReturnType<typeof beam>; effect: Effect; exact: (xi: number) => number }> = [
  { name: "simple span, left reaction", member: beam([L], ["pin", "pin"], []), effect: { kind: "reaction", node: 1 }, exact: (xi) => (L - xi) / L },
  {
    name: "simple span, moment at a = 3",
    member: beam([L], ["pin", "pin"], []),
    effect: { kind: "moment", x: 3 },
    exact: (xi) => (xi <= 3 ? (xi * (L - 3)) / L : (3 * (L - xi)) / L),
  },
  {
    name: "simple span, shear at a = 3 (load at a counts as just left)",
    member: beam([L], ["pin", "pin"], []),
    effect: { kind: "shear", x: 3 },
    exact: (xi) => (xi <= 3 ? -xi / L : (L - xi) / L),
  },
  {
    name: "propped cantilever (fixed at 0, pin at L), prop reaction: xi^2 (3L - xi) / 2L^3",
    member: beam([L], ["fixed", "pin"], [], 1),
    effect: { kind: "reaction", node: 2 },
    exact: (xi) => (xi * xi * (3 * L - xi)) / (2 * L ** 3),
  },
  {
    name: "cantilever (fixed at 0), moment reaction: counter-clockwise xi",
    member: beam([L], ["fixed", "free"], []),
    effect: { kind: "moment-reaction", node: 1 },
    exact: (xi) => xi,
  },
];

describe("influence lines against Muller-Breslau closed forms", () => {
  it.each(cases)("$name", ({ member, effect, exact }) => {
    const ordinates = influenceLine(member, effect, positions);
    positions.forEach((xi, i) => {
      expect(relDiff(ordinates[i], exact(xi), 1)).toBeLessThan(HANDBOOK_TOLERANCE);
    });
  });

  it("Maxwell-Betti: the influence line of deflection at a equals the deflected shape under a unit load at a", () => {
    const member = beam([5, 7, 4], ["fixed", "pin", 50, "pin"], [], [2000, 3000, 2500]);
    const a = 6.3;
    const line = influenceLine(member, { kind: "deflection", x: a }, positions.map((p) => (p * 16) / 8));
    const shape = solve({ ...member, loads: [point(1, a)] });
    positions.forEach((p, i) => {
      expect(relDiff(line[i], valueAt(shape, "deflection", (p * 16) / 8), 1e-6)).toBeLessThan(1e-9);
    });
  });

  it("rejects an effect off the member or a node that does not exist", () => {
    expect(() => influenceLine(beam([L], ["pin", "pin"], []), { kind: "moment", x: 9 }, [1])).toThrow(/x = 9 is outside the member/);
    expect(() => influenceLine(beam([L], ["pin", "pin"], []), { kind: "reaction", node: 3 }, [1])).toThrow(/node 3 does not exist/);
    expect(() => influenceLine(beam([L], ["pin", "pin"], []), { kind: "reaction", node: 1 }, [-1])).toThrow(/position -1 is outside/);
  });
});
