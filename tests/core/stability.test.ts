import fc from "fast-check";
import { checkStability } from "../../src/core/stability";
import { member, type SupportWord } from "./support/build";
import { caught } from "./support/expectError";
import { ReferenceMechanism, referenceSolve } from "./support/reference";

describe("checkStability: table of support layouts", () => {
  const stable: [string, number[], SupportWord[]][] = [
    ["simple span", [6], ["pin", "pin"]],
    ["cantilever fixed at the left", [6], ["fixed", "free"]],
    ["cantilever fixed at the right", [6], ["free", "fixed"]],
    ["propped cantilever", [6], ["fixed", "pin"]],
    ["fixed both ends", [6], ["fixed", "fixed"]],
    ["overhang on both sides", [2, 6, 2], ["free", "pin", "pin", "free"]],
    ["spring and pin", [6], ["pin", 100]],
    ["two springs", [6], [100, 100]],
    ["fixed, hinge, pin (a cantilever carrying a suspended span)", [4, 4], ["fixed", "hinge", "pin"]],
    ["pin, pin, hinge, pin", [4, 4, 4], ["pin", "pin", "hinge", "pin"]],
    ["pin, hinge, pin, pin", [4, 4, 4], ["pin", "hinge", "pin", "pin"]],
    ["free interior node joining two spans", [3, 3], ["fixed", "free", "free"]],
    ["a rigid part past a hinge, held by a pin beyond a free node", [4, 4, 4], ["fixed", "hinge", "free", "pin"]],
    ["two hinges, each side held", [3, 3, 3, 3], ["fixed", "hinge", "pin", "hinge", "fixed"]],
  ];
  test.each(stable)("stable: %s", (_name, spans, supports) => {
    expect(() => checkStability(member({ spans, supports, EI: 1 }))).not.toThrow();
  });

  const unstable: [string, number[], SupportWord[], RegExp][] = [
    ["no support at all", [6], ["free", "free"], /x = 0 to x = 6/],
    ["a single pin", [6], ["pin", "free"], /x = 0 to x = 6/],
    ["three hinges in a row (pin, hinge, pin)", [4, 4], ["pin", "hinge", "pin"], /unstable/],
    ["cantilever with a hinge and nothing beyond", [4, 4], ["fixed", "hinge", "free"], /x = 4 to x = 8/],
    ["free end, hinge, fixed", [4, 4], ["free", "hinge", "fixed"], /x = 0 to x = 4/],
    ["a single spring", [6], [100, "free"], /x = 0 to x = 6/],
    ["two hinges between a fixed end and a pin", [3, 3, 3, 3], ["fixed", "hinge", "free", "hinge", "pin"], /x = 3 to x = 12/],
  ];
  test.each(unstable)("unstable: %s", (_name, spans, supports, where) => {
    const error = caught(() => checkStability(member({ spans, supports, EI: 1 })));
    expect(error.code).toBe("#VALUE!");
    expect(error.message).toMatch(/mechanism|move/i);
    expect(error.message).toMatch(where);
  });
});

describe("checkStability agrees with the independent reference on random layouts", () => {
  const word = fc.constantFrom<SupportWord>("pin", "fixed", "free", "hinge", "free", "hinge", 250);
  const layout = fc
    .integer({ min: 1, max: 5 })
    .chain((n) =>
      fc.record({
        spans: fc.array(fc.integer({ min: 1, max: 12 }), { minLength: n, maxLength: n }),
        supports: fc.array(word, { minLength: n + 1, maxLength: n + 1 }),
      }),
    )
    .map(({ spans, supports }) => {
      const fixedEnds = supports.map((s, i) => (s === "hinge" && (i === 0 || i === supports.length - 1) ? "free" : s));
      return { spans, supports: fixedEnds };
    });

  test("mechanism exactly when the reference's system is singular", () => {
    fc.assert(
      fc.property(layout, ({ spans, supports }) => {
        const m = member({ spans, supports, EI: 1 });
        let referenceStable = true;
        try {
          referenceSolve(m);
        } catch (error) {
          if (!(error instanceof ReferenceMechanism)) throw error;
          referenceStable = false;
        }
        let coreStable = true;
        try {
          checkStability(m);
        } catch (error) {
          coreStable = false;
          expect((error as { code?: string }).code).toBe("#VALUE!");
        }
        expect({ spans, supports, coreStable }).toEqual({ spans, supports, coreStable: referenceStable });
      }),
      { numRuns: 600 },
    );
  });
});
