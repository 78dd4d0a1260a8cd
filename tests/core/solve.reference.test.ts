/**
 * The solver against an independent computation with ml-matrix (tests/core/support/reference.ts:
 * force method with singularity functions) on random stable members: reactions, and shear,
 * moment, slope and deflection at nodes, load positions and points in between.
 */
import fc from "fast-check";
import { solve } from "../../src/core/solve";
import { valueAt } from "../../src/core/evaluate";
import type { Member, Quantity } from "../../src/core/model";
import { HANDBOOK_TOLERANCE } from "../../src/core/tolerance";
import { loadedMember, offGridFractions } from "./support/arbitraries";
import { memberLength, scales } from "./support/build";
import { expectClose } from "./support/expectClose";
import { referenceSolve } from "./support/reference";

const QUANTITIES: Quantity[] = ["shear", "moment", "slope", "deflection"];

function stations(m: Member, fractions: number[]): number[] {
  const length = memberLength(m);
  const xs = new Set<number>([0, length]);
  let x = 0;
  for (const span of m.spans) {
    x += span;
    xs.add(Math.min(x, length));
  }
  for (const load of m.loads) {
    xs.add(load.xStart);
    if (load.kind === "udl" || load.kind === "linear") xs.add(load.xEnd);
  }
  for (const f of fractions) xs.add(f * length);
  return [...xs].sort((a, b) => a - b);
}

function compare(m: Member, fractions: number[]): void {
  const core = solve(m);
  const reference = referenceSolve(m);
  const scale = scales(m);
  expect(core.reactions).toHaveLength(m.supports.length);
  core.reactions.forEach((r, i) => {
    expectClose(`reaction force at node ${i}`, r.force, reference.reactions[i].force, HANDBOOK_TOLERANCE, scale.force);
    expectClose(`reaction moment at node ${i}`, r.moment, reference.reactions[i].moment, HANDBOOK_TOLERANCE, scale.moment);
  });
  for (const x of stations(m, fractions)) {
    for (const q of QUANTITIES) {
      expectClose(`${q} at x = ${x}`, valueAt(core, q, x), reference.at(q, x), HANDBOOK_TOLERANCE, scale[q]);
    }
  }
}

describe("solve agrees with the independent reference", () => {
  test("random stable members with every load type", () => {
    fc.assert(
      fc.property(loadedMember, offGridFractions, (m, fractions) => compare(m, fractions)),
      { numRuns: 400 },
    );
  });
});
