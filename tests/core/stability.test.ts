/**
 * Stability from the support layout alone. A table of layouts (with the part that can move,
 * where it is clear), and a property: checkStability rejects a layout exactly when an
 * independent dense stiffness matrix (kit/denseStiffness.ts) is singular: the ratio of its smallest
 * to largest eigenvalue is rounding-sized for a mechanism and far from it otherwise (the
 * property also checks that no layout falls in between, so the threshold decides nothing).
 */
import fc from "fast-check";
import { checkStability, solve } from "../../src/core";
import { thrown } from "./kit/errors";
import { beam, point, type SupportWord } from "./kit/members";
import { stiffnessConditionRatio } from "./kit/denseStiffness";
import { runs } from "./kit/random";

const MECHANISM = /^unstable: the part of the member from x = (-?[\d.e+-]+) to x = (-?[\d.e+-]+) can move freely \(a mechanism\)/;

const stable: [string, number[], SupportWord[]][] = [
  ["simple span", [6], ["pin", "pin"]],
  ["two cantilevers joined by a hinge", [3, 4], ["fixed", "hinge", "fixed"]],
  ["cantilever carrying a suspended span on a hinge", [3, 4], ["fixed", "hinge", "pin"]],
  ["hinged (Gerber) member: span with overhang, hinge, suspended span", [6, 2, 4], ["pin", "pin", "hinge", "pin"]],
  ["hinged (Gerber) member with two hinges", [5, 1, 5, 1, 4], ["pin", "pin", "hinge", "pin", "hinge", "pin"]],
  ["suspended span first, then a span with overhang", [4, 1, 6], ["pin", "hinge", "pin", "pin"]],
  ["link between two cantilevers (two hinges)", [2, 3, 2], ["fixed", "hinge", "hinge", "fixed"]],
  ["two springs", [5], [300, 400]],
  ["fixed end and a free node", [2, 3], ["fixed", "free", "free"]],
  ["overhangs both sides", [1, 5, 1], ["free", "pin", "pin", "free"]],
  ["cantilever fixed at the left", [6], ["fixed", "free"]],
  ["cantilever fixed at the right", [6], ["free", "fixed"]],
  ["propped cantilever", [6], ["fixed", "pin"]],
  ["fixed both ends", [6], ["fixed", "fixed"]],
  ["spring and pin", [6], ["pin", 100]],
  ["a rigid part past a hinge, held by a pin beyond a free node", [4, 4, 4], ["fixed", "hinge", "free", "pin"]],
  ["two hinges, each side held", [3, 3, 3, 3], ["fixed", "hinge", "pin", "hinge", "fixed"]],
];

const unstable: [string, number[], SupportWord[], [number, number] | null][] = [
  ["all free", [6], ["free", "free"], [0, 6]],
  ["all free, two spans", [2, 4], ["free", "free", "free"], [0, 6]],
  ["a single pin", [6], ["pin", "free"], [0, 6]],
  ["a single interior pin", [3, 3], ["free", "pin", "free"], [0, 6]],
  ["a single spring", [6], [500, "free"], [0, 6]],
  ["a hinge in a simple span", [4, 4], ["pin", "hinge", "pin"], [0, 8]],
  // the whole chain can move, and so can 0..4 alone (with the last segment held, 0..4 is pin-hinge-hinge)
  ["pin and hinge chain", [2, 2, 2], ["pin", "hinge", "hinge", "pin"], null],
  ["a dangling part past a hinge", [4, 4], ["fixed", "hinge", "free"], [4, 8]],
  ["free end, hinge, fixed", [4, 4], ["free", "hinge", "fixed"], [0, 4]],
  ["a dangling part past a hinge at the end of an overhang", [4, 4, 4], ["pin", "pin", "hinge", "free"], [8, 12]],
  ["a hinge chain between a fixed end and a pin", [3, 3, 3, 3], ["fixed", "hinge", "free", "hinge", "pin"], [3, 12]],
  ["three hinges between two fixed ends", [2, 2, 2, 2], ["fixed", "hinge", "hinge", "hinge", "fixed"], null],
];

describe("checkStability: layouts", () => {
  it.each(stable)("stable: %s", (_name, spans, supports) => {
    expect(() => checkStability(beam(spans, supports, [], 1))).not.toThrow();
    expect(stiffnessConditionRatio(beam(spans, supports, [], 1))).toBeGreaterThan(1e-6);
  });

  it.each(unstable)("unstable: %s", (_name, spans, supports, part) => {
    const m = beam(spans, supports, [], 1);
    expect(stiffnessConditionRatio(m)).toBeLessThan(1e-10);
    const error = thrown(() => checkStability(m));
    expect(error.code).toBe("#VALUE!");
    const found = MECHANISM.exec(error.message);
    expect(found).not.toBeNull();
    const L = spans.reduce((a, b) => a + b, 0);
    if (found) expect(Number(found[1]) >= 0 && Number(found[1]) < Number(found[2]) && Number(found[2]) <= L).toBe(true);
    if (part && found) expect([Number(found[1]), Number(found[2])]).toEqual(part);
  });

  it("is decided by the layout, not the loads: a single pin with balanced loads is still a mechanism", () => {
    const m = beam([6], ["pin", "free"], [point(5, 0), point(0, 6)], 1e3);
    expect(thrown(() => checkStability(m)).message).toMatch(MECHANISM);
    expect(thrown(() => solve(m)).message).toMatch(MECHANISM);
    expect(thrown(() => solve({ ...m, loads: [] })).code).toBe("#VALUE!");
  });
});

describe("checkStability agrees with the rank of an independent stiffness matrix", () => {
  const word = fc.constantFrom<SupportWord>("pin", "pin", "fixed", "free", "free", "hinge", "hinge", 2);
  const layout = fc.integer({ min: 1, max: 6 }).chain((n) =>
    fc.record({
      spans: fc.array(fc.integer({ min: 1, max: 4 }), { minLength: n, maxLength: n }),
      supports: fc.array(word, { minLength: n + 1, maxLength: n + 1 }).map((ws) => ws.map((w, i) => (w === "hinge" && (i === 0 || i === n) ? "free" : w))),
    }),
  );

  it("throws exactly when the matrix is singular", () => {
    fc.assert(
      fc.property(layout, ({ spans, supports }) => {
        const m = beam(spans, supports, [], 1);
        const ratio = stiffnessConditionRatio(m);
        // a mechanism's zero eigenvalue shows as rounding (~1e-16); stable layouts here stay far above 1e-10
        const singular = ratio < 1e-10;
        let rejected = false;
        try {
          checkStability(m);
        } catch {
          rejected = true;
        }
        expect({ spans, supports, rejected, ratio: ratio > 1e-6 || ratio < 1e-10 }).toEqual({ spans, supports, rejected: singular, ratio: true });
      }),
      runs(400),
    );
  });

  it("solves every layout it accepts, with finite values", () => {
    fc.assert(
      fc.property(layout, ({ spans, supports }) => {
        const m = beam(spans, supports, [point(3, spans[0] / 2)], 1);
        let accepted = true;
        try {
          checkStability(m);
        } catch {
          accepted = false;
        }
        fc.pre(accepted);
        const sol = solve(m);
        expect(sol.reactions.every((r) => Number.isFinite(r.force) && Number.isFinite(r.moment))).toBe(true);
        expect(sol.displacements.every(Number.isFinite)).toBe(true);
      }),
      runs(150),
    );
  });
});
